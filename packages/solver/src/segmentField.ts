import type { BasisLoads, LoadGrid } from "./loadGrid.js";

/**
 * Exact fields inside one segment. With constant EI and piecewise-linear q, integrating
 * dV/dx = q, dM/dx = V, d(rz)/dx = M/EI and d(uy)/dx = rz − V/(κGA) (the last term only in
 * Timoshenko theory; signs per the exchange format) gives, on each grid interval, polynomials of
 * degree 2 (V), 3 (M), 4 (rz) and 5 (uy) in the local coordinate u = x − x_k. Point forces add
 * to V and applied CCW moments subtract from M where they act. Only V and M at the segment start
 * are unknown; they follow from the nodal displacements at both ends, so the fields are exact
 * for one element per segment and no mesh is needed.
 */
export interface SegmentSection {
  EI: number;
  /** 1/(κGA) in 1/N; 0 for Euler-Bernoulli. */
  shearFlexibility: number;
}

/** Coefficients per interval: V[0..2], M[3..6], rz[7..11], uy[12..17]. */
export const COEFFICIENTS_PER_INTERVAL = 18;
export const V_OFFSET = 0;
export const M_OFFSET = 3;
export const RZ_OFFSET = 7;
export const UY_OFFSET = 12;

/** The state (V, M, rz, uy) carried along a segment; a reusable 4-vector. */
export type FieldState = Float64Array;

/**
 * Marches the state across segment e from `state` (values just right of its left node),
 * leaving in `state` the values just left of its right node. With `coef`, writes each
 * interval's polynomial coefficients at `k·18`. Allocates nothing.
 */
export function marchSegment(
  grid: LoadGrid,
  basis: BasisLoads,
  e: number,
  section: SegmentSection,
  state: FieldState,
  coef?: Float64Array,
): void {
  const kStart = grid.segmentFirstInterval[e]!;
  const kEnd = grid.segmentFirstInterval[e + 1]!;
  const inverseEI = 1 / section.EI;
  const f = section.shearFlexibility;
  let V = state[0]!;
  let M = state[1]!;
  let rz = state[2]!;
  let uy = state[3]!;
  for (let k = kStart; k < kEnd; k++) {
    if (k > kStart) {
      V += basis.fy[k]!;
      M -= basis.mz[k]!;
    }
    const q0 = basis.q0[k]!;
    const q1 = basis.q1[k]!;
    const h = grid.x[k + 1]! - grid.x[k]!;
    const c1 = rz - V * f;
    const c2 = 0.5 * (M * inverseEI - q0 * f);
    const c3 = (V * inverseEI - q1 * f) / 6;
    const c4 = (q0 * inverseEI) / 24;
    const c5 = (q1 * inverseEI) / 120;
    if (coef) {
      const o = k * COEFFICIENTS_PER_INTERVAL;
      coef[o] = V;
      coef[o + 1] = q0;
      coef[o + 2] = 0.5 * q1;
      coef[o + 3] = M;
      coef[o + 4] = V;
      coef[o + 5] = 0.5 * q0;
      coef[o + 6] = q1 / 6;
      coef[o + 7] = rz;
      coef[o + 8] = M * inverseEI;
      coef[o + 9] = 0.5 * V * inverseEI;
      coef[o + 10] = (q0 * inverseEI) / 6;
      coef[o + 11] = (q1 * inverseEI) / 24;
      coef[o + 12] = uy;
      coef[o + 13] = c1;
      coef[o + 14] = c2;
      coef[o + 15] = c3;
      coef[o + 16] = c4;
      coef[o + 17] = c5;
    }
    uy = uy + h * (c1 + h * (c2 + h * (c3 + h * (c4 + h * c5))));
    rz = rz + h * inverseEI * (M + h * (0.5 * V + h * (q0 / 6 + (h * q1) / 24)));
    M = M + h * (V + h * (0.5 * q0 + (h * q1) / 6));
    V = V + h * (q0 + 0.5 * h * q1);
  }
  state[0] = V;
  state[1] = M;
  state[2] = rz;
  state[3] = uy;
}

/**
 * V and M just right of the segment's left node that make the segment end at the given
 * displacements. `particular` is the end state of a march from a zero state (loads only).
 * Homogeneous part: rz(L) = rz₀ + (M₀L + V₀L²/2)/EI, uy(L) = uy₀ + rz₀L + M₀L²/2EI + V₀(L³/6EI − L/κGA).
 */
export function solveStartForces(
  length: number,
  section: SegmentSection,
  particular: FieldState,
  uy0: number,
  rz0: number,
  uyL: number,
  rzL: number,
  at = 0,
): { V0: number; M0: number } {
  const L = length;
  const EI = section.EI;
  // Both equations multiplied by EI to keep the coefficients of similar size.
  const r1 = (rzL - rz0 - particular[at + 2]!) * EI;
  // uyL − uy0 − rz0·L via the chord rotation: the rigid-body part cancels before rounding.
  const chord = (uyL - uy0) / L;
  const r2 = ((chord - rz0) * L - particular[at + 3]!) * EI;
  const a11 = L;
  const a12 = 0.5 * L * L;
  const a22 = (L * L * L) / 6 - section.shearFlexibility * EI * L;
  const det = a11 * a22 - a12 * a12;
  return { M0: (r1 * a22 - a12 * r2) / det, V0: (a11 * r2 - a12 * r1) / det };
}

/**
 * Equivalent nodal loads of the segment's span loads (the negated fixed-end reactions), in the
 * element order (uy₁, rz₁, uy₂, rz₂), from the fixed-end start forces and the particular state.
 */
export function equivalentNodalLoads(length: number, section: SegmentSection, particular: FieldState, out: Float64Array): void {
  const { V0, M0 } = solveStartForces(length, section, particular, 0, 0, 0, 0);
  const VL = V0 + particular[0]!;
  const ML = M0 + V0 * length + particular[1]!;
  // Fixed-end reactions on the element: left (V₀, −M₀), right (−V(L), M(L)); see M = ΣF(x−xᵢ) − Σm.
  out[0] = -V0;
  out[1] = M0;
  out[2] = VL;
  out[3] = -ML;
}
