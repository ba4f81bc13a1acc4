import type { Analysis, Curve } from "./analysisTypes.js";
import { evaluatePolynomial, signChangesInto } from "./polynomial.js";
import { COEFFICIENTS_PER_INTERVAL, M_OFFSET, RZ_OFFSET, UY_OFFSET, V_OFFSET } from "./segmentField.js";

/** A field of the beam: shear V (N), moment M (N·m, sagging +), deflection uy (m, up +), rotation rz (rad, CCW +). */
export type Quantity = "V" | "M" | "uy" | "rz";
/** Which side of a discontinuity to read: the contract reports the right side except at the right end. */
export type Side = "left" | "right";

export interface FieldValues {
  V: number;
  M: number;
  uy: number;
  rz: number;
}

/** An exact extreme over the beam and the x (m) where it occurs (the first, if it repeats). */
export interface Extreme {
  value: number;
  x: number;
}

export interface Extremes {
  Mmax: Extreme;
  Mmin: Extreme;
  Vmax: Extreme;
  Vmin: Extreme;
  uyMax: Extreme;
  uyMin: Extreme;
}

/** Where each quantity's polynomial sits in an interval's 18 coefficients, and its degree. */
export const QUANTITY_LAYOUT: Record<Quantity, { offset: number; degree: number }> = {
  V: { offset: V_OFFSET, degree: 2 },
  M: { offset: M_OFFSET, degree: 3 },
  rz: { offset: RZ_OFFSET, degree: 4 },
  uy: { offset: UY_OFFSET, degree: 5 },
};

/** The curve of a load case or combination id (all pattern pieces loaded), or undefined. */
export function findCurve(analysis: Analysis, id: string): Curve | undefined {
  return analysis.cases.find((c) => c.id === id)?.curve ?? analysis.combinations.find((c) => c.id === id)?.curve;
}

/**
 * The grid interval to read at x. On the right side a breakpoint belongs to the interval on its
 * right; on the left side, to the one on its left. Beyond the ends, the end intervals (clamped).
 */
export function locateInterval(grid: ArrayLike<number>, x: number, side: Side = "right"): number {
  const K = grid.length - 1;
  let lo = 0;
  let hi = K;
  // Invariant: the answer lies in [lo, hi − 1].
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    const g = grid[mid]!;
    if (x > g || (side === "right" && x === g)) lo = mid;
    else hi = mid;
  }
  return lo;
}

function evaluateAt(curve: Curve, k: number, u: number, quantity: Quantity): number {
  const { offset, degree } = QUANTITY_LAYOUT[quantity];
  return evaluatePolynomial(curve.coef, k * COEFFICIENTS_PER_INTERVAL + offset, degree, u);
}

/**
 * V, M, uy and rz at x for a load case or combination id (undefined for an unknown id).
 * At a discontinuity `side` picks the value just left or right of x (default right, as the
 * contract's stations; at the right end the left value is the only one).
 */
export function valuesAt(analysis: Analysis, id: string, x: number, side: Side = "right"): FieldValues | undefined {
  const curve = findCurve(analysis, id);
  if (!curve) return undefined;
  const k = locateInterval(analysis.grid, x, side);
  const u = x - analysis.grid[k]!;
  return { V: evaluateAt(curve, k, u, "V"), M: evaluateAt(curve, k, u, "M"), uy: evaluateAt(curve, k, u, "uy"), rz: evaluateAt(curve, k, u, "rz") };
}

/** A polyline: x (m) and value, in order. */
export interface Diagram {
  x: Float64Array;
  y: Float64Array;
}

/**
 * The diagram of one quantity for a case or combination id, for drawing. Each grid interval gives
 * samplesPerPiece + 1 points including both ends, so a jump (point load, support) appears as two
 * points at the same x and draws as a vertical step. Between samples the curve is a polynomial
 * of degree ≤ 5; extremes come from `extremes`, not from the samples.
 */
export function diagram(analysis: Analysis, id: string, quantity: Quantity, samplesPerPiece = 16): Diagram | undefined {
  const curve = findCurve(analysis, id);
  if (!curve) return undefined;
  const grid = analysis.grid;
  const K = grid.length - 1;
  const s = Math.max(1, Math.floor(samplesPerPiece));
  const x = new Float64Array(K * (s + 1));
  const y = new Float64Array(K * (s + 1));
  for (let k = 0, p = 0; k < K; k++) {
    const h = grid[k + 1]! - grid[k]!;
    for (let i = 0; i <= s; i++, p++) {
      const u = i === s ? h : (h * i) / s;
      x[p] = i === s ? grid[k + 1]! : grid[k]! + u;
      y[p] = evaluateAt(curve, k, u, quantity);
    }
  }
  return { x, y };
}

/** Tracks the running maximum and minimum with the first x where each occurs. */
export class ExtremeTracker {
  maxValue = -Infinity;
  maxX = 0;
  minValue = Infinity;
  minX = 0;

  reset(): void {
    this.maxValue = -Infinity;
    this.minValue = Infinity;
    this.maxX = 0;
    this.minX = 0;
  }

  visit(value: number, x: number): void {
    if (value > this.maxValue) {
      this.maxValue = value;
      this.maxX = x;
    }
    if (value < this.minValue) {
      this.minValue = value;
      this.minX = x;
    }
  }

  get max(): Extreme {
    return { value: this.maxValue, x: this.maxX };
  }

  get min(): Extreme {
    return { value: this.minValue, x: this.minX };
  }
}

/** Roots of a derivative in `visitPolynomialExtremes` (reused: a call keeps none past its return). */
let roots = new Float64Array(8);

/**
 * Visits the values of a polynomial of u on [lo, h] (lo = 0 unless given) at both ends and at every
 * interior extreme (sign change of its derivative), u reported at x0 + u; `scratch` needs length ≥
 * degree. The right end is reported at x1 (the breakpoint itself, free of rounding in x0 + h).
 */
export function visitPolynomialExtremes(
  coef: ArrayLike<number>,
  offset: number,
  degree: number,
  h: number,
  x0: number,
  x1: number,
  scratch: Float64Array,
  tracker: ExtremeTracker,
  lo = 0,
): void {
  tracker.visit(evaluatePolynomial(coef, offset, degree, lo), x0 + lo);
  for (let k = 1; k <= degree; k++) scratch[k - 1] = k * coef[offset + k]!;
  if (roots.length < degree) roots = new Float64Array(degree);
  const count = signChangesInto(scratch, 0, degree - 1, lo, h, roots);
  for (let i = 0; i < count; i++) tracker.visit(evaluatePolynomial(coef, offset, degree, roots[i]!), x0 + roots[i]!);
  tracker.visit(evaluatePolynomial(coef, offset, degree, h), x1);
}

/** The exact maximum and minimum of V, M and uy over the beam for one curve. */
export function curveExtremes(grid: ArrayLike<number>, curve: Curve): Extremes {
  const V = new ExtremeTracker();
  const M = new ExtremeTracker();
  const uy = new ExtremeTracker();
  const scratch = new Float64Array(6);
  const coef = curve.coef;
  for (let k = 0; k + 1 < grid.length; k++) {
    const x0 = grid[k]!;
    const x1 = grid[k + 1]!;
    const h = x1 - x0;
    const o = k * COEFFICIENTS_PER_INTERVAL;
    visitPolynomialExtremes(coef, o + V_OFFSET, 2, h, x0, x1, scratch, V);
    visitPolynomialExtremes(coef, o + M_OFFSET, 3, h, x0, x1, scratch, M);
    visitPolynomialExtremes(coef, o + UY_OFFSET, 5, h, x0, x1, scratch, uy);
  }
  return { Mmax: M.max, Mmin: M.min, Vmax: V.max, Vmin: V.min, uyMax: uy.max, uyMin: uy.min };
}

/** Exact extremes of V, M and uy for a load case or combination id (undefined for an unknown id). */
export function extremes(analysis: Analysis, id: string): Extremes | undefined {
  const curve = findCurve(analysis, id);
  return curve ? curveExtremes(analysis.grid, curve) : undefined;
}
