/**
 * Test-side view of the exchange format (spanwright.beam/1 in, spanwright.result/1 out), written
 * from the contract page alone so the verification suite does not share types with the engine.
 * Units are SI base units throughout: N, m, Pa, m^4, N/m, N·m, rad.
 */
import { expect } from "vitest";

export type SupportSpec =
  | { type: "pinned" }
  | { type: "fixed" }
  | { type: "guided" }
  | { type: "spring"; ky?: number; kr?: number };

export interface NodeSpec {
  x: number;
  support?: SupportSpec;
  hinge?: boolean;
}

export interface SegmentSpec {
  E: number;
  I: number;
  A?: number;
  G?: number;
  shearFactor?: number;
}

export type LoadSpec =
  | { type: "point"; x: number; fy: number }
  | { type: "moment"; x: number; mz: number }
  | { type: "distributed"; x1: number; x2: number; qy1: number; qy2: number }
  | { type: "settlement"; node: number; uy: number };

export interface LoadCaseSpec {
  id: string;
  category: string;
  pattern?: boolean;
  loads: LoadSpec[];
}

export interface CombinationSpec {
  id: string;
  factors: Record<string, number>;
}

export interface BeamModel {
  format: "spanwright.beam/1";
  title?: string;
  theory?: "euler-bernoulli" | "timoshenko";
  nodes: NodeSpec[];
  segments: SegmentSpec[];
  loadCases: LoadCaseSpec[];
  combinations?: CombinationSpec[];
  stations?: number[];
}

export interface Extreme {
  value: number;
  x: number;
}

export interface ReactionRow {
  node: number;
  fy: number;
  mz: number;
}

export interface NodeRow {
  node: number;
  uy: number;
  rz?: number;
  rzLeft?: number;
  rzRight?: number;
}

export interface StationRow {
  x: number;
  V: number;
  M: number;
  uy: number;
  rz: number;
}

export type ExtremeKey = "Mmax" | "Mmin" | "Vmax" | "Vmin" | "uyMax" | "uyMin";

export interface CaseResult {
  reactions: ReactionRow[];
  nodes: NodeRow[];
  stations: StationRow[];
  extremes: Record<ExtremeKey, Extreme>;
}

export interface EnvelopeReactionRow {
  node: number;
  fyMax: number;
  fyMin: number;
  mzMax: number;
  mzMin: number;
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
  reactions: EnvelopeReactionRow[];
  stations: EnvelopeStationRow[];
  extremes: Partial<Record<ExtremeKey, Extreme>>;
}

export interface SolveOutput {
  format: "spanwright.result/1";
  results: Record<string, CaseResult>;
  envelopes: Record<string, EnvelopeResult>;
}

/** Relative tolerance the contract promises ("relative error around 1e-9 or better"). */
export const REL = 1e-9;

/**
 * Asserts |got − expected| ≤ rel·max(|expected|, scale). `scale` is the size of the quantity in the
 * problem (e.g. wL² for moments) so that expected zeros are judged against a meaningful magnitude.
 */
export function expectClose(got: number | undefined, expected: number, scale = 0, rel = REL): void {
  expect(typeof got, `expected a number near ${expected}`).toBe("number");
  const bound = rel * Math.max(Math.abs(expected), Math.abs(scale), Number.MIN_VALUE);
  const diff = Math.abs((got as number) - expected);
  if (!(diff <= bound)) {
    expect.fail(`got ${got}, expected ${expected} (|diff| ${diff.toExponential(3)} > ${bound.toExponential(3)})`);
  }
}

export function caseResult(out: SolveOutput, id: string): CaseResult {
  const r = out.results[id];
  if (!r) expect.fail(`no result for "${id}"`);
  return r;
}

export function envelope(out: SolveOutput, id: string): EnvelopeResult {
  const r = out.envelopes[id];
  if (!r) expect.fail(`no envelope for "${id}"`);
  return r;
}

export function reactionAt(r: CaseResult, node: number): ReactionRow {
  const row = r.reactions.find((q) => q.node === node);
  if (!row) expect.fail(`no reaction row for node ${node}`);
  return row;
}

export function nodeAt(r: CaseResult, node: number): NodeRow {
  const row = r.nodes.find((q) => q.node === node);
  if (!row) expect.fail(`no node row for node ${node}`);
  return row;
}

export function stationAt(r: CaseResult, x: number): StationRow {
  const row = r.stations.find((s) => Math.abs(s.x - x) <= 1e-12 * Math.max(1, Math.abs(x)));
  if (!row) expect.fail(`no station at x = ${x}`);
  return row;
}

/** A one-case model with uniform E, I over every segment. */
export function beam(
  nodes: NodeSpec[],
  loads: LoadSpec[],
  opts: { EI?: { E: number; I: number }; stations?: number[]; segment?: Partial<SegmentSpec>; theory?: BeamModel["theory"] } = {},
): BeamModel {
  const { E, I } = opts.EI ?? { E: 2.0e11, I: 1.0e-4 };
  const model: BeamModel = {
    format: "spanwright.beam/1",
    nodes,
    segments: nodes.slice(1).map(() => ({ E, I, ...opts.segment })),
    loadCases: [{ id: "A", category: "other", loads }],
  };
  if (opts.stations) model.stations = opts.stations;
  if (opts.theory) model.theory = opts.theory;
  return model;
}
