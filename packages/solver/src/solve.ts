import { analyzeModel } from "./analyze.js";
import type { Analysis, Curve } from "./analysisTypes.js";
import { envelopeAt, envelopeExtremes, reactionEnvelope, type ReactionEnvelope } from "./envelopeQueries.js";
import { unwrap } from "./errors.js";
import { curveExtremes, locateInterval, QUANTITY_LAYOUT, type Extremes } from "./fieldQueries.js";
import { evaluatePolynomial } from "./polynomial.js";
import { COEFFICIENTS_PER_INTERVAL } from "./segmentField.js";
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
      const at = (q: "V" | "M" | "uy" | "rz") => evaluatePolynomial(curve.coef, o + QUANTITY_LAYOUT[q].offset, QUANTITY_LAYOUT[q].degree, u);
      return { x, V: at("V"), M: at("M"), uy: at("uy"), rz: at("rz") };
    }),
    extremes: curveExtremes(grid, curve),
  };
}

function envelopeResult(analysis: Analysis, id: string): EnvelopeResult {
  const xEnd = analysis.grid[analysis.grid.length - 1]!;
  return {
    reactions: reactionEnvelope(analysis, id)!,
    stations: analysis.stations.map((x) => {
      const e = envelopeAt(analysis, id, x, x >= xEnd ? "left" : "right")!;
      return { x, Mmax: e.Mmax, Mmin: e.Mmin, Vmax: e.Vmax, Vmin: e.Vmin, uyMax: e.uyMax, uyMin: e.uyMin };
    }),
    extremes: envelopeExtremes(analysis, id)!,
  };
}

/** Builds the exchange-format result from an analysis. */
export function buildSolveResult(analysis: Analysis): SolveResult {
  const results: Record<string, CaseResult> = {};
  for (const c of analysis.cases) results[c.id] = caseResult(analysis, c.curve);
  for (const c of analysis.combinations) results[c.id] = caseResult(analysis, c.curve);
  const envelopes: Record<string, EnvelopeResult> = {};
  for (const c of analysis.combinations) envelopes[c.id] = envelopeResult(analysis, c.id);
  if (analysis.combinations.length > 0) envelopes["*"] = envelopeResult(analysis, "*");
  return { format: "spanwright.result/1", results, envelopes };
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
