(globalThis as any).NOROWS = process.env.NOROWS === "1";
import { analyze, beamModelSchema, solve } from "../src/index.js";
import { validateModel } from "../src/validateModel.js";
import { analyzeModel } from "../src/analyze.js";
import { unwrap } from "../src/errors.js";
import { prepareEnvelopeExtremes, envelopeExtremesOf } from "../src/envelopeExtremes.js";
import { envelopeFactorSets, reactionEnvelope } from "../src/envelopeQueries.js";
import { curveRanges, extremesOfRanges, combinationExtremes } from "../src/curveRanges.js";
import { reactionParts } from "../src/envelopeQueries.js";
import { placeStations, curveStationRows, envelopeStationRows, stationValues } from "../src/stationRows.js";
import { interactiveModel } from "./models.js";
const input = interactiveModel();
const names = ["validate", "analyze", "places+values", "curveRows", "curveExtremes", "prepare", "envRows", "envExtremes", "reactions"];
const acc: number[][] = names.map(() => []);
let ws = new Float64Array(0);
for (let it = 0; it < 1500; it++) {
  const t: number[] = [performance.now()];
  const v = unwrap(validateModel(input)); t.push(performance.now());
  const a = unwrap(analyzeModel(v)); t.push(performance.now());
  const places = placeStations(a.grid, a.stations);
  const size = 4 * places.x.length;
  if (ws.length < size * 17) ws = new Float64Array(size * 17);
  const curves = [...a.cases, ...a.combinations];
  const vals = curves.map((c, i) => stationValues(places, c.curve, ws.subarray(i * size, (i + 1) * size))); t.push(performance.now());
  const rows = curves.map((c, i) => curveStationRows(places, c.curve, vals[i])); t.push(performance.now());
  const cr = a.cases.map((c) => curveRanges(a.grid, c.curve)); a.cases.map((c, i) => extremesOfRanges(cr[i]!)); a.combinations.map((c, i) => combinationExtremes(a, c, cr, { values: vals[a.cases.length + i]!, x: places.x })); t.push(performance.now());
  const ctx = prepareEnvelopeExtremes(a, cr); t.push(performance.now());
  const peaks = new Float64Array(12 * a.combinations.length);
  const env = envelopeStationRows(a, places, ctx, peaks, vals.slice(a.cases.length)); t.push(performance.now());
  const ee = a.combinations.map((c, i) => envelopeExtremesOf(ctx, envelopeFactorSets(a, c.id)!, peaks.subarray(12 * i, 12 * i + 12))); t.push(performance.now());
  const rp = reactionParts(a); const re = [...a.combinations.map((c) => c.id), "*"].map((id) => reactionEnvelope(a, id, rp)); t.push(performance.now());
  if (it >= 300) for (let i = 0; i < names.length; i++) acc[i]!.push(t[i + 1]! - t[i]!);
}
let total = 0;
for (let i = 0; i < names.length; i++) { const s = acc[i]!.sort((x, y) => x - y); const m = s[s.length >> 1]!; total += m; console.log(names[i]!.padEnd(16), m.toFixed(3), "p10", s[Math.floor(s.length / 10)]!.toFixed(3)); }
console.log("sum of medians", total.toFixed(3));
const tt: number[] = []; for (let i = 0; i < 500; i++) { const s = performance.now(); solve(input); tt.push(performance.now() - s); } tt.sort((x, y) => x - y); console.log("solve median", tt[250]!.toFixed(3), "fastest", tt[0]!.toFixed(3));
