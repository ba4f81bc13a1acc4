import { analyzeModel } from "./analyze.js";
import type { Analysis, Curve } from "./analysisTypes.js";
import { prepareEnvelopeExtremes, envelopeExtremesOf, type EnvelopeExtremesContext } from "./envelopeExtremes.js";
import { envelopeFactorSets, reactionEnvelope, reactionParts, type ReactionEnvelope } from "./envelopeQueries.js";
import { unwrap } from "./errors.js";
import { combinationExtremes, curveRanges, extremesOfRanges, type CurveRanges } from "./curveRanges.js";
import type { Extremes } from "./fieldQueries.js";
import { curveStationRows, envelopeStationRows, placeStations, stationValues, type EnvelopeStationRow, type StationPlaces, type StationRow } from "./stationRows.js";
import { validateModel } from "./validateModel.js";
import { workArray } from "./workBuffers.js";

export type { EnvelopeStationRow, StationRow } from "./stationRows.js";

export interface ReactionRow {
  node: number;
  fy: number;
  mz: number;
}

/** A node's displacements; a hinged node reports rzLeft and rzRight instead of rz. */
export type NodeRow = { node: number; uy: number; rz: number } | { node: number; uy: number; rzLeft: number; rzRight: number };

export interface CaseResult {
  reactions: ReactionRow[];
  nodes: NodeRow[];
  stations: StationRow[];
  extremes: Extremes;
}

export interface EnvelopeResult {
  reactions: ReactionEnvelope[];
  stations: EnvelopeStationRow[];
  extremes: Extremes;
}

/** The result of the exchange format (`spanwright.result/1`). */
export interface SolveResult {
  format: "spanwright.result/1";
  results: Record<string, CaseResult>;
  envelopes: Record<string, EnvelopeResult>;
}

function caseResult(analysis: Analysis, places: StationPlaces, curve: Curve, values: Float64Array, extremes: Extremes): CaseResult {
  return {
    reactions: analysis.supportedNodes.map((node, r) => ({ node, fy: curve.fy[r]!, mz: curve.mz[r]! })),
    nodes: analysis.nodes.map((node, i) =>
      node.hinge ? { node: i, uy: curve.uy[i]!, rzLeft: curve.rzLeft[i]!, rzRight: curve.rzRight[i]! } : { node: i, uy: curve.uy[i]!, rz: curve.rzRight[i]! },
    ),
    stations: curveStationRows(places, curve, values),
    extremes,
  };
}

function envelopeResults(analysis: Analysis, places: StationPlaces, ids: string[], combinationValues: Float64Array[], caseRanges: CurveRanges[]): Record<string, EnvelopeResult> {
  if (ids.length === 0) return {};
  const context: EnvelopeExtremesContext = prepareEnvelopeExtremes(analysis, caseRanges);
  // envelopeStationRows gives the combinations in order, then "*": the order of ids.
  const peaks = new Float64Array(12 * analysis.combinations.length);
  const stations = envelopeStationRows(analysis, places, context, peaks, combinationValues);
  const out: Record<string, EnvelopeResult> = {};
  const perCombination = new Map<string, EnvelopeResult>();
  const reactions = reactionParts(analysis);
  ids.forEach((id, i) => {
    const sets = envelopeFactorSets(analysis, id)!;
    // "*" reuses the extremes of the combinations: the worst of the worst.
    const extremes = id === "*" ? worstOf([...perCombination.values()].map((e) => e.extremes)) : envelopeExtremesOf(context, sets, peaks.subarray(12 * i, 12 * i + 12));
    const result = { reactions: reactionEnvelope(analysis, id, reactions)!, stations: stations[i]!, extremes };
    if (id !== "*") perCombination.set(id, result);
    out[id] = result;
  });
  return out;
}

function worstOf(list: Extremes[]): Extremes {
  const pick = (key: keyof Extremes, isMax: boolean) =>
    list.reduce((best, e) => ((isMax ? e[key].value > best.value : e[key].value < best.value) ? e[key] : best), list[0]![key]);
  return { Mmax: pick("Mmax", true), Mmin: pick("Mmin", false), Vmax: pick("Vmax", true), Vmin: pick("Vmin", false), uyMax: pick("uyMax", true), uyMin: pick("uyMin", false) };
}

/** Work space for the station values (`workArray`: nothing returned refers to it). */
const workspace = { array: new Float64Array(0) };

/** Builds the exchange-format result from an analysis. */
export function buildSolveResult(analysis: Analysis): SolveResult {
  const results: Record<string, CaseResult> = {};
  const places = placeStations(analysis.grid, analysis.stations);
  const size = 4 * places.x.length;
  const work = workArray(size * (analysis.combinations.length + 1), workspace);
  const slot = (i: number) => work.subarray(i * size, (i + 1) * size);
  // the cases' ranges per interval give their extremes and bound the combinations' (and envelopes')
  const caseRanges = analysis.cases.map((c) => curveRanges(analysis.grid, c.curve));
  analysis.cases.forEach((c, i) => (results[c.id] = caseResult(analysis, places, c.curve, stationValues(places, c.curve, slot(0)), extremesOfRanges(caseRanges[i]!))));
  // the combinations' station values also give their envelope rows
  const combinationValues = analysis.combinations.map((c, i) => stationValues(places, c.curve, slot(i + 1)));
  analysis.combinations.forEach((c, i) => {
    const extremes = combinationExtremes(analysis, c, caseRanges, { values: combinationValues[i]!, x: places.x });
    results[c.id] = caseResult(analysis, places, c.curve, combinationValues[i]!, extremes);
  });
  const ids = analysis.combinations.length > 0 ? [...analysis.combinations.map((c) => c.id), "*"] : [];
  return { format: "spanwright.result/1", results, envelopes: envelopeResults(analysis, places, ids, combinationValues, caseRanges) };
}

/**
 * Solves a beam model in the exchange format and returns the result JSON. `model` is untrusted
 * input: it is validated first. Throws `SolverError` (`invalid-model`, `mechanism`) for expected
 * failures; the library has no size limit (`too-large` belongs to the API's limits).
 */
export function solve(model: unknown): SolveResult {
  const validated = unwrap(validateModel(model));
  return buildSolveResult(unwrap(analyzeModel(validated)));
}
