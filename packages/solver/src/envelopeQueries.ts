import type { Analysis } from "./analysisTypes.js";
import { locateInterval, QUANTITY_LAYOUT, type Side } from "./fieldQueries.js";
import { COEFFICIENTS_PER_INTERVAL } from "./segmentField.js";

/** The quantities the contract envelopes. */
export type EnvelopeQuantity = "V" | "M" | "uy";
export const ENVELOPE_QUANTITIES: readonly EnvelopeQuantity[] = ["V", "M", "uy"];

export interface EnvelopeValues {
  Vmax: number;
  Vmin: number;
  Mmax: number;
  Mmin: number;
  uyMax: number;
  uyMin: number;
}

export interface ReactionEnvelope {
  node: number;
  fyMax: number;
  fyMin: number;
  mzMax: number;
  mzMin: number;
}

/** Factors over load cases (by index); an envelope id stands for one or more of these. */
export type FactorSet = { caseIndex: number; factor: number }[];

/**
 * The factored sums an envelope id stands for: a combination id (its factors), a load case id
 * (factor 1), or "*" (every combination). Undefined for an unknown id, or "*" without combinations.
 */
export function envelopeFactorSets(analysis: Analysis, id: string): FactorSet[] | undefined {
  if (id === "*") return analysis.combinations.length > 0 ? analysis.combinations.map((c) => c.factors) : undefined;
  const combination = analysis.combinations.find((c) => c.id === id);
  if (combination) return [combination.factors];
  const caseIndex = analysis.cases.findIndex((c) => c.id === id);
  return caseIndex >= 0 ? [[{ caseIndex, factor: 1 }]] : undefined;
}

/**
 * Per load case at one point: [value, positive part, negative part]. For a patterned case the
 * parts sum its span pieces by sign, so the worst arrangement for any factor f is f·positive
 * (or f·negative) without enumerating the 2ⁿ arrangements; for other cases both parts are the value.
 */
/** Horner's rule inlined here: this loop runs for every piece at every sample of an envelope. */
function horner(coef: Float64Array, o: number, degree: number, u: number): number {
  let v = coef[o + degree]!;
  for (let i = degree - 1; i >= 0; i--) v = v * u + coef[o + i]!;
  return v;
}

export function evaluateCaseParts(analysis: Analysis, k: number, u: number, quantity: EnvelopeQuantity, out: Float64Array, at = 0): void {
  const { offset, degree } = QUANTITY_LAYOUT[quantity];
  const o = k * COEFFICIENTS_PER_INTERVAL + offset;
  const cases = analysis.cases;
  for (let c = 0; c < cases.length; c++) {
    const loadCase = cases[c]!;
    if (!loadCase.pattern) {
      const v = horner(loadCase.curve.coef, o, degree, u);
      out[at + 3 * c] = v;
      out[at + 3 * c + 1] = v;
      out[at + 3 * c + 2] = v;
      continue;
    }
    let positive = 0;
    let negative = 0;
    const pieces = loadCase.pieces;
    for (let p = 0; p < pieces.length; p++) {
      const v = horner(pieces[p]!.curve.coef, o, degree, u);
      if (v > 0) positive += v;
      else negative += v;
    }
    out[at + 3 * c] = positive + negative;
    out[at + 3 * c + 1] = positive;
    out[at + 3 * c + 2] = negative;
  }
}

/**
 * Writes [max, min] over the factor sets to out[at], out[at + 1], from case parts (as
 * `evaluateCaseParts` writes them) starting at parts[from]: patterned cases count their adverse
 * pieces only.
 */
export function envelopeOfSets(sets: FactorSet[], parts: Float64Array, from: number, out: Float64Array, at: number): void {
  let max = -Infinity;
  let min = Infinity;
  for (let s = 0; s < sets.length; s++) {
    const factors = sets[s]!;
    let hi = 0;
    let lo = 0;
    for (let i = 0; i < factors.length; i++) {
      const { caseIndex, factor } = factors[i]!;
      const positive = factor * parts[from + 3 * caseIndex + 1]!;
      const negative = factor * parts[from + 3 * caseIndex + 2]!;
      if (positive >= negative) {
        hi += positive;
        lo += negative;
      } else {
        hi += negative;
        lo += positive;
      }
    }
    if (hi > max) max = hi;
    if (lo < min) min = lo;
  }
  out[at] = max;
  out[at + 1] = min;
}

/**
 * The envelope of V, M and uy at x for a combination id, a load case id or "*": at each point the
 * worst of all 2ⁿ on/off arrangements of pattern pieces, found by adding only the pieces that
 * push the value the adverse way (no enumeration). Undefined for an unknown id.
 */
export function envelopeAt(analysis: Analysis, id: string, x: number, side: Side = "right"): EnvelopeValues | undefined {
  const sets = envelopeFactorSets(analysis, id);
  if (!sets) return undefined;
  const k = locateInterval(analysis.grid, x, side);
  const u = x - analysis.grid[k]!;
  const parts = new Float64Array(3 * analysis.cases.length);
  const values = new Float64Array(6);
  ENVELOPE_QUANTITIES.forEach((quantity, q) => {
    evaluateCaseParts(analysis, k, u, quantity, parts);
    envelopeOfSets(sets, parts, 0, values, 2 * q);
  });
  return { Vmax: values[0]!, Vmin: values[1]!, Mmax: values[2]!, Mmin: values[3]!, uyMax: values[4]!, uyMin: values[5]! };
}

/** Upper and lower envelope polylines, sampled like `diagram` (both values at each breakpoint). */
export interface EnvelopeDiagram {
  x: Float64Array;
  max: Float64Array;
  min: Float64Array;
}

/** The envelope of one quantity as polylines for drawing; extremes come from `envelopeExtremes`. */
export function envelopeDiagram(analysis: Analysis, id: string, quantity: EnvelopeQuantity, samplesPerPiece = 16): EnvelopeDiagram | undefined {
  const sets = envelopeFactorSets(analysis, id);
  if (!sets) return undefined;
  const grid = analysis.grid;
  const K = grid.length - 1;
  const s = Math.max(1, Math.floor(samplesPerPiece));
  const parts = new Float64Array(3 * analysis.cases.length);
  const out = { x: new Float64Array(K * (s + 1)), max: new Float64Array(K * (s + 1)), min: new Float64Array(K * (s + 1)) };
  const pair = new Float64Array(2);
  for (let k = 0, p = 0; k < K; k++) {
    const h = grid[k + 1]! - grid[k]!;
    for (let i = 0; i <= s; i++, p++) {
      const u = i === s ? h : (h * i) / s;
      out.x[p] = i === s ? grid[k + 1]! : grid[k]! + u;
      evaluateCaseParts(analysis, k, u, quantity, parts);
      envelopeOfSets(sets, parts, 0, pair, 0);
      out.max[p] = pair[0]!;
      out.min[p] = pair[1]!;
    }
  }
  return out;
}

/**
 * The case parts (as `evaluateCaseParts`) of every support reaction: 3·cases numbers for fy and
 * then for mz of each supported node, in order. Shared by the reaction envelopes of every id.
 */
export function reactionParts(analysis: Analysis): Float64Array {
  const cases = analysis.cases;
  const stride = 3 * cases.length;
  const parts = new Float64Array(2 * stride * analysis.supportedNodes.length);
  analysis.supportedNodes.forEach((_, r) => {
    (["fy", "mz"] as const).forEach((key, j) => {
      const at = (2 * r + j) * stride;
      for (let c = 0; c < cases.length; c++) {
        const loadCase = cases[c]!;
        if (!loadCase.pattern) {
          const value = loadCase.curve[key][r]!;
          parts[at + 3 * c] = value;
          parts[at + 3 * c + 1] = value;
          parts[at + 3 * c + 2] = value;
          continue;
        }
        // Added from 0 in piece order: only the adverse pieces count (see evaluateCaseParts).
        let positive = 0;
        let negative = 0;
        for (const piece of loadCase.pieces) {
          const value = piece.curve[key][r]!;
          positive += Math.max(0, value);
          negative += Math.min(0, value);
        }
        parts[at + 3 * c] = positive + negative;
        parts[at + 3 * c + 1] = positive;
        parts[at + 3 * c + 2] = negative;
      }
    });
  });
  return parts;
}

/** Envelope of the support reactions for an id, one row per supported node (`parts`: `reactionParts`). */
export function reactionEnvelope(analysis: Analysis, id: string, parts: Float64Array = reactionParts(analysis)): ReactionEnvelope[] | undefined {
  const sets = envelopeFactorSets(analysis, id);
  if (!sets) return undefined;
  const stride = 3 * analysis.cases.length;
  const bounds = new Float64Array(4); // fyMax, fyMin, mzMax, mzMin
  return analysis.supportedNodes.map((node, r) => {
    envelopeOfSets(sets, parts, 2 * r * stride, bounds, 0);
    envelopeOfSets(sets, parts, (2 * r + 1) * stride, bounds, 2);
    return { node, fyMax: bounds[0]!, fyMin: bounds[1]!, mzMax: bounds[2]!, mzMin: bounds[3]! };
  });
}
