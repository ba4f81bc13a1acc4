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
row("buildSolveResult", median(() => buildSolveResult(analysis), 30));
row("solve (all)", median(() => solve(input), 30));
row("JSON.stringify(solve)", median(() => JSON.stringify(solve(input)), 10));

import { prepareEnvelopeExtremes, envelopeExtremesOf } from "../src/envelopeExtremes.js";
import { envelopeFactorSets } from "../src/envelopeQueries.js";
import { curveExtremes } from "../src/fieldQueries.js";
const context = prepareEnvelopeExtremes(analysis);
row("prepareEnvelopeExtremes", median(() => prepareEnvelopeExtremes(analysis), 30));
row("envelopeExtremesOf x10", median(() => analysis.combinations.forEach((c) => envelopeExtremesOf(context, envelopeFactorSets(analysis, c.id)!)), 30));
row("curveExtremes x16", median(() => [...analysis.cases, ...analysis.combinations].forEach((c) => curveExtremes(analysis.grid, c.curve)), 30));
console.log("grid intervals", analysis.grid.length - 1, "cuts per interval (L, M):", context.splits.M[2]!.map((s) => s.cuts.length).join(","));
import { placeStations, curveStationRows, envelopeStationRows, stationValues } from "../src/stationRows.js";
import { reactionEnvelope } from "../src/envelopeQueries.js";
const places = placeStations(analysis.grid, analysis.stations);
row("placeStations", median(() => placeStations(analysis.grid, analysis.stations), 30));
row("stationValues x16", median(() => [...analysis.cases, ...analysis.combinations].forEach((c) => stationValues(places, c.curve)), 30));
const values = [...analysis.cases, ...analysis.combinations].map((c) => stationValues(places, c.curve));
row("curveStationRows x16 (rows only)", median(() => [...analysis.cases, ...analysis.combinations].forEach((c, i) => curveStationRows(places, c.curve, values[i])), 30));
const combinationValues = values.slice(analysis.cases.length);
row("envelopeStationRows", median(() => envelopeStationRows(analysis, places, context, undefined, combinationValues), 30));
row("reactionEnvelope x11", median(() => [...analysis.combinations.map((c) => c.id), "*"].forEach((id) => reactionEnvelope(analysis, id)), 30));
