/**
 * The exchange-format shapes this package reads (spanwright.beam/1 and spanwright.result/1, see
 * shared/contract/exchange-format.md). Kept minimal and local until @spanwright/solver exports its
 * own `BeamModel` and `SolveResult`; they are structural types, so the solver's values fit them.
 * All values are SI base units: N, m, N/m, N·m. y up, forces positive upward, mz counterclockwise.
 */

export type SupportSpec =
  | { type: "pinned" }
  | { type: "fixed" }
  | { type: "guided" }
  | { type: "spring"; ky?: number; kr?: number };

export type SupportType = SupportSpec["type"];

export interface BeamNode {
  x: number;
  support?: SupportSpec;
  hinge?: boolean;
}

export interface BeamSegment {
  E: number;
  I: number;
  A?: number;
  G?: number;
  shearFactor?: number;
}

export type BeamLoad =
  | { type: "point"; x: number; fy: number }
  | { type: "moment"; x: number; mz: number }
  | { type: "distributed"; x1: number; x2: number; qy1: number; qy2: number }
  | { type: "settlement"; node: number; uy: number };

export type LoadCategory =
  | "dead"
  | "live"
  | "roof-live"
  | "snow"
  | "rain"
  | "wind"
  | "earthquake"
  | "settlement"
  | "other";

export const LOAD_CATEGORIES: readonly LoadCategory[] = [
  "dead",
  "live",
  "roof-live",
  "snow",
  "rain",
  "wind",
  "earthquake",
  "settlement",
  "other",
];

export interface LoadCase {
  id: string;
  category: LoadCategory;
  pattern?: boolean;
  loads: BeamLoad[];
}

export interface Combination {
  id: string;
  factors: Record<string, number>;
}

export interface BeamModel {
  format: "spanwright.beam/1";
  title?: string;
  theory?: "euler-bernoulli" | "timoshenko";
  nodes: BeamNode[];
  segments: BeamSegment[];
  loadCases: LoadCase[];
  combinations: Combination[];
  stations?: number[];
}

export interface Extreme {
  value: number;
  x: number;
}

export interface ReactionResult {
  node: number;
  fy: number;
  mz: number;
}

export interface StationResult {
  x: number;
  V: number;
  M: number;
  uy: number;
  rz: number;
}

export interface CaseResult {
  reactions: ReactionResult[];
  nodes: Array<{ node: number; uy: number; rz?: number; rzLeft?: number; rzRight?: number }>;
  stations?: StationResult[];
  extremes: Record<"Mmax" | "Mmin" | "Vmax" | "Vmin" | "uyMax" | "uyMin", Extreme>;
}

export interface EnvelopeReaction {
  node: number;
  fyMax: number;
  fyMin: number;
  mzMax: number;
  mzMin: number;
}

export interface EnvelopeStation {
  x: number;
  Mmax: number;
  Mmin: number;
  Vmax: number;
  Vmin: number;
  uyMax: number;
  uyMin: number;
}

export interface EnvelopeResult {
  reactions: EnvelopeReaction[];
  stations?: EnvelopeStation[];
  extremes: Partial<Record<"Mmax" | "Mmin" | "Vmax" | "Vmin" | "uyMax" | "uyMin", Extreme>>;
}

export interface SolveResult {
  format: "spanwright.result/1";
  results: Record<string, CaseResult>;
  envelopes: Record<string, EnvelopeResult>;
}
