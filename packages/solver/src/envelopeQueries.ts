import type { Analysis, Curve } from "./analysisTypes.js";
import { ExtremeTracker, locateInterval, QUANTITY_LAYOUT, visitPolynomialExtremes, type Extreme, type Extremes, type Side } from "./fieldQueries.js";
import { evaluatePolynomial, findSignChanges } from "./polynomial.js";
import { COEFFICIENTS_PER_INTERVAL } from "./segmentField.js";

/** The quantities the contract envelopes. */
export type EnvelopeQuantity = "V" | "M" | "uy";

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

/**
 * One factored sum of load cases: fixed curves (non-patterned cases, already factored) and,
 * per patterned case in it, the factored span pieces, each of which may be on or off.
 */
interface EnvelopeTerms {
  fixed: { curve: Curve; factor: number }[];
  pieces: { curve: Curve; factor: number }[];
}

/**
 * The factored sums an envelope id stands for: a combination id (its factors), a load case id
 * (factor 1), or "*" (every combination). Undefined for an unknown id, or "*" without combinations.
 */
function envelopeTerms(analysis: Analysis, id: string): EnvelopeTerms[] | undefined {
  const toTerms = (factors: { caseIndex: number; factor: number }[]): EnvelopeTerms => {
    const terms: EnvelopeTerms = { fixed: [], pieces: [] };
    for (const { caseIndex, factor } of factors) {
      const loadCase = analysis.cases[caseIndex]!;
      if (factor === 0) continue;
      if (loadCase.pattern) for (const piece of loadCase.pieces) terms.pieces.push({ curve: piece.curve, factor });
      else terms.fixed.push({ curve: loadCase.curve, factor });
    }
    return terms;
  };
  if (id === "*") return analysis.combinations.length > 0 ? analysis.combinations.map((c) => toTerms(c.factors)) : undefined;
  const combination = analysis.combinations.find((c) => c.id === id);
  if (combination) return [toTerms(combination.factors)];
  const caseIndex = analysis.cases.findIndex((c) => c.id === id);
  return caseIndex >= 0 ? [toTerms([{ caseIndex, factor: 1 }])] : undefined;
}

/** Envelope of one quantity at (k, u): fixed part plus only the adverse pattern pieces. */
function envelopeOfTerms(all: EnvelopeTerms[], k: number, u: number, quantity: EnvelopeQuantity): [number, number] {
  const { offset, degree } = QUANTITY_LAYOUT[quantity];
  const o = k * COEFFICIENTS_PER_INTERVAL + offset;
  let max = -Infinity;
  let min = Infinity;
  for (const terms of all) {
    let base = 0;
    let positive = 0;
    let negative = 0;
    for (const { curve, factor } of terms.fixed) base += factor * evaluatePolynomial(curve.coef, o, degree, u);
    for (const { curve, factor } of terms.pieces) {
      const v = factor * evaluatePolynomial(curve.coef, o, degree, u);
      if (v > 0) positive += v;
      else negative += v;
    }
    max = Math.max(max, base + positive);
    min = Math.min(min, base + negative);
  }
  return [max, min];
}

/**
 * The envelope of V, M and uy at x for a combination id, a load case id or "*": at each point the
 * worst of all 2ⁿ on/off arrangements of pattern pieces, found by adding only the pieces that
 * push the value the adverse way (no enumeration). Undefined for an unknown id.
 */
export function envelopeAt(analysis: Analysis, id: string, x: number, side: Side = "right"): EnvelopeValues | undefined {
  const all = envelopeTerms(analysis, id);
  if (!all) return undefined;
  const k = locateInterval(analysis.grid, x, side);
  const u = x - analysis.grid[k]!;
  const [Vmax, Vmin] = envelopeOfTerms(all, k, u, "V");
  const [Mmax, Mmin] = envelopeOfTerms(all, k, u, "M");
  const [uyMax, uyMin] = envelopeOfTerms(all, k, u, "uy");
  return { Vmax, Vmin, Mmax, Mmin, uyMax, uyMin };
}

/** Upper and lower envelope polylines, sampled like `diagram` (both values at each breakpoint). */
export interface EnvelopeDiagram {
  x: Float64Array;
  max: Float64Array;
  min: Float64Array;
}

export function envelopeDiagram(analysis: Analysis, id: string, quantity: EnvelopeQuantity, samplesPerPiece = 16): EnvelopeDiagram | undefined {
  const all = envelopeTerms(analysis, id);
  if (!all) return undefined;
  const grid = analysis.grid;
  const K = grid.length - 1;
  const s = Math.max(1, Math.floor(samplesPerPiece));
  const out = { x: new Float64Array(K * (s + 1)), max: new Float64Array(K * (s + 1)), min: new Float64Array(K * (s + 1)) };
  for (let k = 0, p = 0; k < K; k++) {
    const h = grid[k + 1]! - grid[k]!;
    for (let i = 0; i <= s; i++, p++) {
      const u = i === s ? h : (h * i) / s;
      out.x[p] = i === s ? grid[k + 1]! : grid[k]! + u;
      [out.max[p], out.min[p]] = envelopeOfTerms(all, k, u, quantity);
    }
  }
  return out;
}

/** Envelope of the support reactions for an id, one row per supported node. */
export function reactionEnvelope(analysis: Analysis, id: string): ReactionEnvelope[] | undefined {
  const all = envelopeTerms(analysis, id);
  if (!all) return undefined;
  return analysis.supportedNodes.map((node, r) => {
    const row = { node, fyMax: -Infinity, fyMin: Infinity, mzMax: -Infinity, mzMin: Infinity };
    for (const terms of all) {
      for (const key of ["fy", "mz"] as const) {
        let base = 0;
        let positive = 0;
        let negative = 0;
        for (const { curve, factor } of terms.fixed) base += factor * curve[key][r]!;
        for (const { curve, factor } of terms.pieces) {
          const v = factor * curve[key][r]!;
          if (v > 0) positive += v;
          else negative += v;
        }
        if (key === "fy") {
          row.fyMax = Math.max(row.fyMax, base + positive);
          row.fyMin = Math.min(row.fyMin, base + negative);
        } else {
          row.mzMax = Math.max(row.mzMax, base + positive);
          row.mzMin = Math.min(row.mzMin, base + negative);
        }
      }
    }
    return row;
  });
}

/**
 * Exact extremes of the envelope over the beam: within a grid interval each piece is one
 * polynomial, so between the points where any piece changes sign the upper (and lower) envelope
 * is itself a polynomial, whose extremes are found exactly.
 */
export function envelopeExtremes(analysis: Analysis, id: string): Extremes | undefined {
  const all = envelopeTerms(analysis, id);
  if (!all) return undefined;
  const result = {} as Record<"V" | "M" | "uy", { max: Extreme; min: Extreme }>;
  for (const quantity of ["V", "M", "uy"] as const) {
    const upper = new ExtremeTracker();
    const lower = new ExtremeTracker();
    for (const terms of all) termsExtremes(analysis.grid, terms, quantity, upper, lower);
    result[quantity] = { max: upper.max, min: lower.min };
  }
  return {
    Mmax: result.M.max,
    Mmin: result.M.min,
    Vmax: result.V.max,
    Vmin: result.V.min,
    uyMax: result.uy.max,
    uyMin: result.uy.min,
  };
}

function termsExtremes(grid: ArrayLike<number>, terms: EnvelopeTerms, quantity: EnvelopeQuantity, upper: ExtremeTracker, lower: ExtremeTracker): void {
  const { offset, degree } = QUANTITY_LAYOUT[quantity];
  const n = degree + 1;
  const upperBase = new Float64Array(n);
  const lowerBase = new Float64Array(n);
  const poly = new Float64Array(n);
  const scratch = new Float64Array(n);
  const switching: { curve: Curve; factor: number }[] = [];
  const visitUpper = (v: number, x: number) => upper.visit(v, x);
  const visitLower = (v: number, x: number) => lower.visit(v, x);
  for (let k = 0; k + 1 < grid.length; k++) {
    const h = grid[k + 1]! - grid[k]!;
    const o = k * COEFFICIENTS_PER_INTERVAL + offset;
    upperBase.fill(0);
    for (const { curve, factor } of terms.fixed) for (let i = 0; i < n; i++) upperBase[i]! += factor * curve.coef[o + i]!;
    lowerBase.set(upperBase);
    switching.length = 0;
    const cuts = [0, h];
    for (const piece of terms.pieces) {
      const roots = findSignChanges(piece.curve.coef, o, degree, 0, h);
      if (roots.length > 0) {
        switching.push(piece);
        cuts.push(...roots);
        continue;
      }
      const sign = piece.factor * evaluatePolynomial(piece.curve.coef, o, degree, 0.5 * h);
      const target = sign > 0 ? upperBase : lowerBase;
      for (let i = 0; i < n; i++) target[i]! += piece.factor * piece.curve.coef[o + i]!;
    }
    cuts.sort((a, b) => a - b);
    for (let c = 0; c + 1 < cuts.length; c++) {
      const a = cuts[c]!;
      const b = cuts[c + 1]!;
      if (!(b > a)) continue;
      const mid = 0.5 * (a + b);
      for (const [base, wantPositive, visit] of [
        [upperBase, true, visitUpper],
        [lowerBase, false, visitLower],
      ] as const) {
        poly.set(base);
        for (const { curve, factor } of switching) {
          const v = factor * evaluatePolynomial(curve.coef, o, degree, mid);
          if (v > 0 === wantPositive && v !== 0) for (let i = 0; i < n; i++) poly[i]! += factor * curve.coef[o + i]!;
        }
        // Shift to the sub-interval start so the root search runs on [0, b − a].
        const shifted = shiftPolynomial(poly, degree, a);
        visitPolynomialExtremes(shifted, 0, degree, b - a, grid[k]! + a, scratch, visit);
      }
    }
  }
}

/** Coefficients of p(u + a) in powers of u (Taylor shift by repeated synthetic division). */
function shiftPolynomial(p: Float64Array, degree: number, a: number): Float64Array {
  const q = Float64Array.from(p);
  if (a === 0) return q;
  for (let i = 0; i < degree; i++) for (let j = degree - 1; j >= i; j--) q[j]! += a * q[j + 1]!;
  return q;
}
