/**
 * Breakdown of `solve()` on the interactive model by stage (not a timed test): `pnpm exec
 * tsx packages/solver/bench/profile.ts`. Uses the clock, so it lives outside src/.
 */
import { analyze, beamModelSchema, solve } from "../src/index.js";
import { buildSolveResult } from "../src/solve.js";
import { validateModel } from "../src/validateModel.js";
import { interactiveModel } from "./models.js";

function median(run: () => unknown, runs: number): number {
  for (let i = 0; i < 10; i++) run();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    run();
    t.push(performance.now() - s);
  }
  return t.sort((a, b) => a - b)[runs >> 1]!;
}

const input = interactiveModel();
const model = beamModelSchema.parse(input);
const analysis = analyze(model);
const row = (label: string, t: number) => console.log(`${label.padEnd(28)} ${t.toFixed(3)} ms`);
row("validateModel", median(() => validateModel(input), 50));
row("analyze", median(() => analyze(model), 50));
row("buildSolveResult", median(() => buildSolveResult(analysis), 100));
row("solve (all)", median(() => solve(input), 100));
row("JSON.stringify(solve)", median(() => JSON.stringify(solve(input)), 10));

import { prepareEnvelopeExtremes, envelopeExtremesOf } from "../src/envelopeExtremes.js";
import { envelopeFactorSets, reactionEnvelope, reactionParts } from "../src/envelopeQueries.js";
import { combinationExtremes, curveRanges, extremesOfRanges } from "../src/curveRanges.js";
import { placeStations, curveStationRows, envelopeStationRows, stationValues } from "../src/stationRows.js";
// the stages of buildSolveResult, each on its own (solve.ts chains them)
const places = placeStations(analysis.grid, analysis.stations);
row("placeStations", median(() => placeStations(analysis.grid, analysis.stations), 100));
const curves = [...analysis.cases, ...analysis.combinations];
// into one buffer, as solve's kept work array (a 64 kB typed array per call is slow to allocate)
const buffer = new Float64Array(4 * places.x.length * curves.length);
const slot = (i: number) => buffer.subarray(4 * places.x.length * i, 4 * places.x.length * (i + 1));
row("stationValues x16", median(() => curves.forEach((c, i) => stationValues(places, c.curve, slot(i))), 100));
const values = curves.map((c, i) => stationValues(places, c.curve, slot(i)));
row("curveStationRows x16 (rows only)", median(() => curves.forEach((c, i) => curveStationRows(places, c.curve, values[i])), 100));
const caseRanges = analysis.cases.map((c) => curveRanges(analysis.grid, c.curve));
const combinationValues = values.slice(analysis.cases.length);
row("case and combination extremes", median(() => {
  const ranges = analysis.cases.map((c) => curveRanges(analysis.grid, c.curve));
  ranges.forEach((r) => extremesOfRanges(r));
  analysis.combinations.forEach((c, i) => combinationExtremes(analysis, c, ranges, { values: combinationValues[i]!, x: places.x }));
}, 100));
const context = prepareEnvelopeExtremes(analysis, caseRanges);
row("prepareEnvelopeExtremes", median(() => prepareEnvelopeExtremes(analysis, caseRanges), 100));
console.log("grid intervals", analysis.grid.length - 1, "cuts per interval (L, M):", context.splits.M[2]!.map((s) => s.cuts.length).join(","));
const peaks = new Float64Array(12 * analysis.combinations.length);
row("envelopeStationRows", median(() => envelopeStationRows(analysis, places, context, peaks, combinationValues), 100));
row("envelopeExtremesOf x10 (seeded)", median(() => analysis.combinations.forEach((c, i) => envelopeExtremesOf(context, envelopeFactorSets(analysis, c.id)!, peaks.subarray(12 * i, 12 * i + 12))), 100));
const parts = reactionParts(analysis);
row("reactionEnvelope x11", median(() => [...analysis.combinations.map((c) => c.id), "*"].forEach((id) => reactionEnvelope(analysis, id, parts)), 100));
