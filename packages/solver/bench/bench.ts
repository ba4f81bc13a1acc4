/**
 * Benchmark (not a timed test): `pnpm bench` from the repository root. Prints median times for
 * generated beams; the figures and targets are those of the engine's issue. Uses the clock, so
 * it lives outside src/.
 */
import { loadavg } from "node:os";
import { LuDecomposition, Matrix } from "ml-matrix";
import { analyze, diagram, envelopeDiagram, solve, type BeamModel, type BeamModelInput } from "../src/index.js";
import { assembleStiffness, segmentSections } from "../src/assembleStiffness.js";
import { factorBanded, getBanded, solveFactored } from "../src/bandedMatrix.js";
import { numberDofs } from "../src/numberDofs.js";
import { beamModelSchema } from "../src/beamModelSchema.js";

const SPAN = 6;

/** An invented continuous beam: n equal spans on pins, steel section, one load case per list entry. */
function generateBeam(spans: number, cases: BeamModelInput["loadCases"] = [], extra: Partial<BeamModelInput> = {}): BeamModelInput {
  return {
    format: "spanwright.beam/1",
    nodes: Array.from({ length: spans + 1 }, (_, i) => ({ x: i * SPAN, support: { type: "pinned" as const } })),
    segments: Array.from({ length: spans }, () => ({ E: 2e11, I: 8e-5 })),
    loadCases: cases,
    ...extra,
  };
}

function uniform(spans: number, q: number) {
  return [{ type: "distributed" as const, x1: 0, x2: spans * SPAN, qy1: q, qy2: q }];
}

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

function interactiveModel(): BeamModelInput {
  const spans = 20;
  const length = spans * SPAN;
  const point = (x: number, fy: number) => ({ type: "point" as const, x, fy });
  const cases: BeamModelInput["loadCases"] = [
    { id: "D", category: "dead", loads: [...uniform(spans, -12e3), point(15, -40e3), point(63, -25e3)] },
    { id: "SD", category: "dead", loads: [{ type: "distributed", x1: 0, x2: length, qy1: -2e3, qy2: -4e3 }] },
    { id: "L", category: "live", pattern: true, loads: uniform(spans, -15e3) },
    { id: "Lr", category: "roof-live", pattern: true, loads: [...uniform(spans, -3e3), point(33, -8e3)] },
    { id: "S", category: "snow", loads: uniform(spans, -4e3) },
    { id: "W", category: "wind", loads: [{ type: "distributed", x1: 30, x2: 90, qy1: 5e3, qy2: 5e3 }, { type: "moment", x: 45, mz: 20e3 }] },
  ];
  const f = (D: number, rest: Record<string, number>) => ({ D, SD: D, ...rest });
  const combinations = [
    { id: "C1", factors: f(1.4, {}) },
    { id: "C2", factors: f(1.2, { L: 1.6, Lr: 0.5 }) },
    { id: "C3", factors: f(1.2, { L: 1.6, S: 0.5 }) },
    { id: "C4", factors: f(1.2, { Lr: 1.6, L: 1.0 }) },
    { id: "C5", factors: f(1.2, { S: 1.6, L: 1.0 }) },
    { id: "C6", factors: f(1.2, { Lr: 1.6, W: 0.5 }) },
    { id: "C7", factors: f(1.2, { W: 1.0, L: 1.0, Lr: 0.5 }) },
    { id: "C8", factors: f(1.2, { W: 1.0, L: 1.0, S: 0.5 }) },
    { id: "C9", factors: f(0.9, { W: 1.0 }) },
    { id: "C10", factors: f(1.0, { L: 1.0, Lr: 1.0, S: 1.0 }) },
  ];
  const stations = Array.from({ length: spans * 100 }, (_, i) => (i * length) / (spans * 100));
  return generateBeam(spans, cases, { combinations, stations });
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
  const solveTime = time(() => solve(input), 50);
  console.log(`interactive (20 spans, 6 cases, 10 combinations, 2 patterned, 100 stations/span):`);
  console.log(`  analyze(): ${ms(analyzeTime)} (median of 300)`);
  console.log(`  editor path, analyze() + 3 diagrams + "*" M envelope at 100 samples/span: ${ms(editorTime)} (median of 300)`);
  console.log(`  solve(), full result JSON: 2000 stations x 16 results + 11 envelopes, exact envelope extremes: ${ms(solveTime)} (median of 50)`);
  return { solveTime, editorTime, analyzeTime };
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

const reference = referenceLoop();
const { median: single, fastest } = singleCase();
const growth = single[2000]! / single[200]!;
console.log(`  t(2000)/t(200) = ${growth.toFixed(2)} by medians, ${(fastest[2000]! / fastest[200]!).toFixed(2)} by fastest runs`);
const { solveTime, editorTime } = interactive();
const ratio = bandedVersusDense();
const met = (ok: boolean) => (ok ? "met" : "NOT met");
console.log("targets:");
console.log(`  interactive < 2 ms median: editor path ${met(editorTime < 2)} (${ms(editorTime)}); full solve() ${met(solveTime < 2)} (${ms(solveTime)})`);
console.log(`  2000 spans one case < 50 ms: ${met(single[2000]! < 50)}; t(2000)/t(200) <= 12: ${met(growth <= 12)}`);
console.log(`  banded >= 100x faster than dense LU: ${met(ratio >= 100)}`);
console.log(`(load average ${loadAverage()}; reference loop of 1e7 float additions ${ms(reference)}, about 10 ms on an idle core: the machine is shared, so figures vary between runs)`);
