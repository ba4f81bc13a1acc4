/**
 * Benchmark (not a timed test): `pnpm bench` from the repository root. Prints median times for
 * generated beams; the figures and targets are those of the engine's issue. Uses the clock, so
 * it lives outside src/.
 */
import { loadavg } from "node:os";
import { LuDecomposition, Matrix } from "ml-matrix";
import { analyze, diagram, envelopeDiagram, solve, type BeamModel } from "../src/index.js";
import { assembleStiffness, segmentSections } from "../src/assembleStiffness.js";
import { factorBanded, getBanded, solveFactored } from "../src/bandedMatrix.js";
import { numberDofs } from "../src/numberDofs.js";
import { generateBeam, interactiveModel, uniform } from "./models.js";
import { beamModelSchema } from "../src/beamModelSchema.js";
import { analyzeModel } from "../src/analyze.js";
import { unwrap } from "../src/errors.js";
import { curveStationRows, EnvelopeRow, placeStations, stationValues } from "../src/stationRows.js";
import { validateModel } from "../src/validateModel.js";

function median(samples: number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

/** Wall times in ms over `runs` runs after `warmup` unmeasured ones, sorted ascending. */
function samples(run: () => unknown, runs: number, warmup = Math.max(10, Math.floor(runs / 4))): number[] {
  for (let i = 0; i < warmup; i++) run();
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    run();
    out.push(performance.now() - start);
  }
  return out.sort((a, b) => a - b);
}

/** Median wall time in ms. */
function time(run: () => unknown, runs: number, warmup?: number): number {
  return median(samples(run, runs, warmup));
}

const ms = (t: number) => `${t.toFixed(3)} ms`;
const loadAverage = () => loadavg().map((v) => v.toFixed(2)).join(", ");

function singleCase(): { median: Record<number, number>; fastest: Record<number, number> } {
  const result = { median: {} as Record<number, number>, fastest: {} as Record<number, number> };
  for (const spans of [20, 200, 2000]) {
    const model = generateBeam(spans, [{ id: "D", category: "dead", loads: uniform(spans, -10e3) }]);
    const times = samples(() => solve(model), spans >= 2000 ? 40 : 100);
    result.median[spans] = median(times);
    result.fastest[spans] = times[0]!;
    console.log(`one case, ${String(spans).padStart(4)} spans: solve ${ms(median(times))} median, ${ms(times[0]!)} fastest`);
  }
  return result;
}

function interactive(): { solveTime: number; editorTime: number; analyzeTime: number } {
  const input = interactiveModel();
  const model: BeamModel = beamModelSchema.parse(input);
  const samplesPerSpan = 100;
  const analyzeTime = time(() => analyze(model), 300);
  // The editor's path per edit: analyse, then draw M, V and uy of the selected combination and
  // the M envelope over all combinations at 100 samples per span (the grid has ~1 piece per span).
  const editorTime = time(() => {
    const analysis = analyze(model);
    const pieces = analysis.grid.length - 1;
    const samples = Math.ceil((samplesPerSpan * 20) / pieces);
    diagram(analysis, "C2", "M", samples);
    diagram(analysis, "C2", "V", samples);
    diagram(analysis, "C2", "uy", samples);
    return envelopeDiagram(analysis, "*", "M", samples);
  }, 300);
  const solveTime = time(() => solve(input), 100);
  const floorTime = time(() => resultFloor(input), 100);
  console.log(`interactive model (20 spans, 6 cases, 10 combinations, 2 patterned, 100 stations/span):`);
  console.log(`  ISSUE'S INTERACTIVE CASE = full solve() on this model (validate, analyse, 2000 stations x 16 results,`);
  console.log(`    11 envelopes with stations, reactions and exact extremes): ${ms(solveTime)} (median of 100)`);
  console.log(`  of which the format's floor (validate, analyse, station values, the 54,000 row objects; no envelope`);
  console.log(`    or extreme work at all): ${ms(floorTime)} (median of 100)`);
  console.log(`  for comparison, analyze() alone: ${ms(analyzeTime)} (median of 300)`);
  console.log(`  for comparison, editor path (analyze() + 3 diagrams + "*" M envelope at 100 samples/span): ${ms(editorTime)} (median of 300)`);
  return { solveTime, editorTime, analyzeTime };
}

let floorBuffer = new Float64Array(0);

/**
 * What any engine keeping the exchange format must do for this model, without envelopes or
 * extremes: validate, analyse, evaluate every curve at the stations and build every row object
 * (16 curves' station rows, and 11 envelopes' rows, here filled from the combinations' values).
 */
function resultFloor(input: unknown): unknown {
  const analysis = unwrap(analyzeModel(unwrap(validateModel(input))));
  const places = placeStations(analysis.grid, analysis.stations);
  const n = places.x.length;
  const curves = [...analysis.cases, ...analysis.combinations];
  if (floorBuffer.length < 4 * n * curves.length) floorBuffer = new Float64Array(4 * n * curves.length);
  const values = curves.map((c, i) => stationValues(places, c.curve, floorBuffer.subarray(4 * n * i, 4 * n * (i + 1))));
  const rows = curves.map((c, i) => curveStationRows(places, c.curve, values[i]));
  const envelopes: EnvelopeRow[][] = [];
  for (let c = 0; c <= analysis.combinations.length; c++) {
    const v = values[analysis.cases.length + Math.min(c, analysis.combinations.length - 1)]!;
    const list: EnvelopeRow[] = new Array(n);
    for (let s = 0; s < n; s++) list[s] = new EnvelopeRow(places.x[s]!, v[n + s]!, v[n + s]!, v[s]!, v[s]!, v[2 * n + s]!, v[2 * n + s]!);
    envelopes.push(list);
  }
  return [rows, envelopes];
}

function bandedVersusDense(): number {
  const model = beamModelSchema.parse(generateBeam(500, [], { nodes: generateBeam(500).nodes.map((n, i) => (i === 0 || i === 500 ? n : { x: n.x, support: { type: "spring" as const, ky: 5e7 } })) }));
  const dofs = numberDofs(model);
  const { stiffness } = assembleStiffness(model, dofs, segmentSections(model));
  const b = Float64Array.from({ length: dofs.count }, (_, i) => Math.sin(i));
  const banded = time(() => {
    const f = factorBanded(stiffness);
    if (!f.ok) throw new Error("singular");
    const x = Float64Array.from(b);
    solveFactored(f.factors, x);
    return x;
  }, 50);
  const dense = Matrix.zeros(dofs.count, dofs.count);
  for (let i = 0; i < dofs.count; i++) for (let j = Math.max(0, i - dofs.halfBandwidth); j <= Math.min(dofs.count - 1, i + dofs.halfBandwidth); j++) dense.set(i, j, getBanded(stiffness, i, j));
  const rhs = Matrix.columnVector(Array.from(b));
  const lu = time(() => new LuDecomposition(dense).solve(rhs), 5, 1);
  console.log(`500-span system (${dofs.count} DOFs, half-bandwidth ${dofs.halfBandwidth}): banded LDLT ${ms(banded)}, ml-matrix dense LU ${ms(lu)}, ratio ${(lu / banded).toFixed(0)}x`);
  return lu / banded;
}

/** A fixed loop of float additions, to judge how busy the shared machine was during the run. */
function referenceLoop(): number {
  return time(() => {
    let sum = 0;
    for (let i = 0; i < 1e7; i++) sum += i * 0.5;
    return sum;
  }, 9, 2);
}

if (process.env.SPANWRIGHT_BENCH_PART === "interactive") {
  // the second run of bench/run.mjs: the same interactive case under V8's default heap sizes
  interactive();
  process.exit(0);
}
const reference = referenceLoop();
const { median: single, fastest } = singleCase();
const growth = single[2000]! / single[200]!;
console.log(`  t(2000)/t(200) = ${growth.toFixed(2)} by medians, ${(fastest[2000]! / fastest[200]!).toFixed(2)} by fastest runs`);
const { solveTime, editorTime } = interactive();
const ratio = bandedVersusDense();
const met = (ok: boolean) => (ok ? "met" : "NOT met");
console.log("targets:");
console.log(`  interactive case (full solve()) < 2 ms median: ${met(solveTime < 2)} (${ms(solveTime)}); [editor path ${ms(editorTime)}, not the issue's figure]`);
console.log(`  2000 spans one case < 50 ms: ${met(single[2000]! < 50)}; t(2000)/t(200) <= 12: ${met(growth <= 12)}`);
console.log(`  banded >= 100x faster than dense LU: ${met(ratio >= 100)}`);
console.log(`(load average ${loadAverage()}; reference loop of 1e7 float additions ${ms(reference)}, about 10 ms on an idle core: the machine is shared, so figures vary between runs)`);
