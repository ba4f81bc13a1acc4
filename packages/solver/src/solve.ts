import { analyzeModel } from "./analyze.js";
import type { Analysis, Curve } from "./analysisTypes.js";
import { prepareEnvelopeExtremes, envelopeExtremesOf, type EnvelopeExtremesContext } from "./envelopeExtremes.js";
import { combineParts, envelopeFactorSets, evaluateCaseParts, reactionEnvelope, type ReactionEnvelope } from "./envelopeQueries.js";
import { unwrap } from "./errors.js";
import { curveExtremes, locateInterval, type Extremes } from "./fieldQueries.js";
import { evaluatePolynomial } from "./polynomial.js";
import { COEFFICIENTS_PER_INTERVAL, M_OFFSET, RZ_OFFSET, UY_OFFSET, V_OFFSET } from "./segmentField.js";
import { validateModel } from "./validateModel.js";

export interface ReactionRow {
  node: number;
  fy: number;
  mz: number;
}

/** A node's displacements; a hinged node reports rzLeft and rzRight instead of rz. */
export type NodeRow = { node: number; uy: number; rz: number } | { node: number; uy: number; rzLeft: number; rzRight: number };

export interface StationRow {
  x: number;
  V: number;
  M: number;
  uy: number;
  rz: number;
}

export interface CaseResult {
  reactions: ReactionRow[];
  nodes: NodeRow[];
  stations: StationRow[];
  extremes: Extremes;
}

export interface EnvelopeStationRow {
  x: number;
  Mmax: number;
  Mmin: number;
  Vmax: number;
  Vmin: number;
  uyMax: number;
  uyMin: number;
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

/** The side to read at a station: right of x, except at the right end of the beam (contract). */
function stationInterval(analysis: Analysis, x: number): number {
  const grid = analysis.grid;
  return locateInterval(grid, x, x >= grid[grid.length - 1]! ? "left" : "right");
}

function caseResult(analysis: Analysis, curve: Curve): CaseResult {
  const grid = analysis.grid;
  return {
    reactions: analysis.supportedNodes.map((node, r) => ({ node, fy: curve.fy[r]!, mz: curve.mz[r]! })),
    nodes: analysis.nodes.map((node, i) =>
      node.hinge ? { node: i, uy: curve.uy[i]!, rzLeft: curve.rzLeft[i]!, rzRight: curve.rzRight[i]! } : { node: i, uy: curve.uy[i]!, rz: curve.rzRight[i]! },
    ),
    stations: analysis.stations.map((x) => {
      const k = stationInterval(analysis, x);
      const u = x - grid[k]!;
      const o = k * COEFFICIENTS_PER_INTERVAL;
      const c = curve.coef;
      return {
        x,
        V: evaluatePolynomial(c, o + V_OFFSET, 2, u),
        M: evaluatePolynomial(c, o + M_OFFSET, 3, u),
        uy: evaluatePolynomial(c, o + UY_OFFSET, 5, u),
        rz: evaluatePolynomial(c, o + RZ_OFFSET, 4, u),
      };
    }),
    extremes: curveExtremes(grid, curve),
  };
}

/**
 * Envelope station rows for several ids at once: the case parts at each station are evaluated
 * once and shared by every combination (and "*").
 */
function envelopeStations(analysis: Analysis, ids: string[]): EnvelopeStationRow[][] {
  const grid = analysis.grid;
  const xEnd = grid[grid.length - 1]!;
  const sets = ids.map((id) => envelopeFactorSets(analysis, id)!);
  const rows: EnvelopeStationRow[][] = ids.map(() => []);
  const parts = { V: new Float64Array(3 * analysis.cases.length), M: new Float64Array(3 * analysis.cases.length), uy: new Float64Array(3 * analysis.cases.length) };
  for (const x of analysis.stations) {
    const k = locateInterval(grid, x, x >= xEnd ? "left" : "right");
    const u = x - grid[k]!;
    evaluateCaseParts(analysis, k, u, "V", parts.V);
    evaluateCaseParts(analysis, k, u, "M", parts.M);
    evaluateCaseParts(analysis, k, u, "uy", parts.uy);
    sets.forEach((factorSets, i) => {
      const row = { x, Mmax: -Infinity, Mmin: Infinity, Vmax: -Infinity, Vmin: Infinity, uyMax: -Infinity, uyMin: Infinity };
      for (const factors of factorSets) {
        const [Vmax, Vmin] = combineParts(analysis, factors, parts.V);
        const [Mmax, Mmin] = combineParts(analysis, factors, parts.M);
        const [uyMax, uyMin] = combineParts(analysis, factors, parts.uy);
        row.Vmax = Math.max(row.Vmax, Vmax);
        row.Vmin = Math.min(row.Vmin, Vmin);
        row.Mmax = Math.max(row.Mmax, Mmax);
        row.Mmin = Math.min(row.Mmin, Mmin);
        row.uyMax = Math.max(row.uyMax, uyMax);
        row.uyMin = Math.min(row.uyMin, uyMin);
      }
      rows[i]!.push(row);
    });
  }
  return rows;
}

function envelopeResults(analysis: Analysis, ids: string[]): Record<string, EnvelopeResult> {
  const context: EnvelopeExtremesContext = prepareEnvelopeExtremes(analysis);
  const stations = envelopeStations(analysis, ids);
  const out: Record<string, EnvelopeResult> = {};
  const perCombination = new Map<string, EnvelopeResult>();
  ids.forEach((id, i) => {
    const sets = envelopeFactorSets(analysis, id)!;
    // "*" reuses the extremes of the combinations: the worst of the worst.
    const extremes = id === "*" ? worstOf([...perCombination.values()].map((e) => e.extremes)) : envelopeExtremesOf(context, sets);
    const result = { reactions: reactionEnvelope(analysis, id)!, stations: stations[i]!, extremes };
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

/** Builds the exchange-format result from an analysis. */
export function buildSolveResult(analysis: Analysis): SolveResult {
  const results: Record<string, CaseResult> = {};
  for (const c of analysis.cases) results[c.id] = caseResult(analysis, c.curve);
  for (const c of analysis.combinations) results[c.id] = caseResult(analysis, c.curve);
  const ids = analysis.combinations.length > 0 ? [...analysis.combinations.map((c) => c.id), "*"] : [];
  return { format: "spanwright.result/1", results, envelopes: envelopeResults(analysis, ids) };
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
