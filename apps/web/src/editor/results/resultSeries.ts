import {
  diagram,
  envelopeAt,
  envelopeDiagram,
  envelopeExtremes,
  extremes,
  reactionEnvelope,
  valuesAt,
  type Analysis,
  type Extreme,
  type Extremes,
  type Quantity,
} from "@spanwright/solver";
import type { BeamDocument } from "../model/BeamDocument";
import type { ResultTarget } from "../store/uiState";

/** One diagram: sampled x (m) and one line (case, combination) or two (envelope max, min), SI. */
export interface Series {
  readonly quantity: Quantity;
  readonly x: Float64Array;
  readonly lines: readonly Float64Array[];
  /** Exact extremes from the engine (not from the samples); rotation has none in the contract. */
  readonly max: Extreme | null;
  readonly min: Extreme | null;
}

export interface ReactionRow {
  readonly node: number;
  readonly x: number;
  readonly fy: readonly [number, number]; // [max, min]; equal outside envelopes
  readonly mz: readonly [number, number];
}

export const quantities: readonly Quantity[] = ["V", "M", "uy", "rz"];

/** The engine's id for a target: the exchange-format name of the case or combination, or "*". */
export function targetName(doc: BeamDocument, target: ResultTarget): string | null {
  if (target.kind === "case") return doc.loadCases.find((c) => c.id === target.id)?.name ?? null;
  if (target.id === "*") return doc.combinations.length > 0 ? "*" : null;
  return doc.combinations.find((k) => k.id === target.id)?.name ?? null;
}

/** A sensible first view: the envelope over all combinations if there are any, else the first case. */
export function defaultTarget(doc: BeamDocument): ResultTarget | null {
  if (doc.combinations.length > 0) return { kind: "envelope", id: "*" };
  const first = doc.loadCases[0];
  return first ? { kind: "case", id: first.id } : null;
}

// Samples per grid interval: enough for smooth cubic and quintic curves at editor sizes.
const SAMPLES = 24;

/**
 * Envelope extremes per analysis and id: the diagrams and the readout ask for them once per
 * quantity, and each search covers all three quantities (about half a millisecond per call for
 * a 20-span beam with patterned cases).
 */
const envelopeExtremesCache = new WeakMap<Analysis, Map<string, Extremes | undefined>>();

function cachedEnvelopeExtremes(analysis: Analysis, name: string): Extremes | undefined {
  let byName = envelopeExtremesCache.get(analysis);
  if (!byName) envelopeExtremesCache.set(analysis, (byName = new Map()));
  if (!byName.has(name)) byName.set(name, envelopeExtremes(analysis, name));
  return byName.get(name);
}

export function seriesFor(analysis: Analysis, name: string, isEnvelope: boolean, quantity: Quantity): Series | null {
  if (isEnvelope) {
    if (quantity === "rz") return null; // the contract envelopes V, M and uy only
    const d = envelopeDiagram(analysis, name, quantity, SAMPLES);
    const e = cachedEnvelopeExtremes(analysis, name);
    if (!d || !e) return null;
    return { quantity, x: d.x, lines: [d.max, d.min], ...pickExtremes(e, quantity) };
  }
  const d = diagram(analysis, name, quantity, SAMPLES);
  if (!d) return null;
  const e = extremes(analysis, name);
  const picked = quantity === "rz" || !e ? { max: null, min: null } : pickExtremes(e, quantity);
  return { quantity, x: d.x, lines: [d.y], ...picked };
}

function pickExtremes(e: NonNullable<ReturnType<typeof extremes>>, q: Exclude<Quantity, "rz">): { max: Extreme; min: Extreme } {
  switch (q) {
    case "V":
      return { max: e.Vmax, min: e.Vmin };
    case "M":
      return { max: e.Mmax, min: e.Mmin };
    case "uy":
      return { max: e.uyMax, min: e.uyMin };
  }
}

/** Exact values at x for the hover cursor: [max, min] pairs (equal for a single case). */
export function readAt(analysis: Analysis, name: string, isEnvelope: boolean, x: number): Record<Quantity, readonly [number, number]> | null {
  const xEnd = analysis.grid[analysis.grid.length - 1] ?? 0;
  const side = x >= xEnd ? "left" : "right";
  if (isEnvelope) {
    const e = envelopeAt(analysis, name, x, side);
    if (!e) return null;
    return { V: [e.Vmax, e.Vmin], M: [e.Mmax, e.Mmin], uy: [e.uyMax, e.uyMin], rz: [NaN, NaN] };
  }
  const v = valuesAt(analysis, name, x, side);
  if (!v) return null;
  return { V: [v.V, v.V], M: [v.M, v.M], uy: [v.uy, v.uy], rz: [v.rz, v.rz] };
}

/** Support reactions (N, N·m CCW, forces the support exerts on the beam) for the target. */
export function reactionsFor(analysis: Analysis, name: string, isEnvelope: boolean): ReactionRow[] {
  const xOf = (node: number) => analysis.nodes[node]?.x ?? 0;
  if (isEnvelope) {
    return (reactionEnvelope(analysis, name) ?? []).map((r) => ({ node: r.node, x: xOf(r.node), fy: [r.fyMax, r.fyMin], mz: [r.mzMax, r.mzMin] }));
  }
  const curve = analysis.cases.find((c) => c.id === name)?.curve ?? analysis.combinations.find((k) => k.id === name)?.curve;
  if (!curve) return [];
  return analysis.supportedNodes.map((node, r) => ({ node, x: xOf(node), fy: [curve.fy[r]!, curve.fy[r]!], mz: [curve.mz[r]!, curve.mz[r]!] }));
}
