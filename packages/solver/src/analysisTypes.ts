import type { LoadCategory, SupportType, Theory } from "./beamModelSchema.js";
import type { Span } from "./loadGrid.js";

/**
 * The exact solution of one load arrangement. Plain data only (numbers and Float64Arrays), so it
 * survives structured clone when posted from a Web Worker.
 */
export interface Curve {
  /**
   * Per grid interval k, 18 coefficients at k·18 of polynomials in u = x − grid[k]:
   * V (degree 2), M (3), rz (4), uy (5). See `segmentField.ts`.
   */
  coef: Float64Array;
  /** Nodal displacements: uy (m), rotation just left and right of each node (rad; equal unless hinged). */
  uy: Float64Array;
  rzLeft: Float64Array;
  rzRight: Float64Array;
  /** Support reactions (N, N·m CCW) on the beam, one per supported node, in `Analysis.supportedNodes` order. */
  fy: Float64Array;
  mz: Float64Array;
}

export interface AnalysisNode {
  x: number;
  hinge: boolean;
  support: SupportType | null;
}

export interface AnalysisCase {
  id: string;
  category: LoadCategory;
  pattern: boolean;
  /** All pieces loaded. */
  curve: Curve;
  /** For a patterned case, one curve per loaded span (index into `Analysis.spans`); empty otherwise. */
  pieces: { span: number; curve: Curve }[];
}

export interface AnalysisCombination {
  id: string;
  factors: { caseIndex: number; factor: number }[];
  curve: Curve;
}

/** Everything `solve` and the editor need, computed once per model. Plain serialisable data. */
export interface Analysis {
  theory: Theory;
  nodes: AnalysisNode[];
  /** Node indices with a support, in order: the rows of reactions. */
  supportedNodes: number[];
  spans: Span[];
  /** Breakpoints x₀ < … < x_K (m) shared by every curve: nodes and load positions. */
  grid: Float64Array;
  cases: AnalysisCase[];
  combinations: AnalysisCombination[];
  stations: number[];
}
