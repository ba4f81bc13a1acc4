/**
 * A symmetric band matrix stored by rows of its lower band in one Float64Array:
 * entry (i, j) with 0 ≤ i − j ≤ w lives at `i·(w+1) + (w − (i − j))`. Storage and factorisation
 * cost grow linearly with n for a fixed half-bandwidth w (a beam numbered left to right has w ≤ 3).
 */
export interface BandedSymmetricMatrix {
  readonly size: number;
  readonly halfBandwidth: number;
  readonly values: Float64Array;
}

/** The outcome of an LDLᵀ factorisation: either the factors, or the first pivot that vanished. */
export type Factorization =
  | { ok: true; factors: BandedSymmetricMatrix }
  | { ok: false; singularDof: number; mode: Float64Array };

/**
 * A pivot below this fraction of the original diagonal entry counts as zero. Rounding leaves a
 * vanished pivot around 1e-16…1e-13 of the diagonal; genuinely soft supports (springs of a
 * millionth of the beam's stiffness) stay far above it.
 */
export const DEFAULT_PIVOT_TOLERANCE = 1e-11;

export function createBandedMatrix(size: number, halfBandwidth: number): BandedSymmetricMatrix {
  return { size, halfBandwidth, values: new Float64Array(size * (halfBandwidth + 1)) };
}

function index(m: BandedSymmetricMatrix, i: number, j: number): number {
  return i * (m.halfBandwidth + 1) + m.halfBandwidth - (i - j);
}

/** Adds v to entries (i, j) and (j, i); |i − j| must be within the band. */
export function addToBanded(m: BandedSymmetricMatrix, i: number, j: number, v: number): void {
  const r = i >= j ? i : j;
  const c = i >= j ? j : i;
  if (r - c > m.halfBandwidth) throw new RangeError(`entry (${i}, ${j}) lies outside the band ${m.halfBandwidth}`);
  m.values[index(m, r, c)]! += v;
}

export function getBanded(m: BandedSymmetricMatrix, i: number, j: number): number {
  const r = i >= j ? i : j;
  const c = i >= j ? j : i;
  return r - c > m.halfBandwidth ? 0 : m.values[index(m, r, c)]!;
}

/**
 * Factors A = L·D·Lᵀ (unit lower L, stored below the diagonal; D on the diagonal) without
 * pivoting, which is stable for the positive (semi)definite matrices of a stiffness method.
 * On a pivot that vanishes relative to its original diagonal, returns that DOF and the null
 * vector it reveals: the leading block is singular, and because A is positive semidefinite
 * the vector z with z_j = 1, Lᵀz = 0 above j and zeros below is a null vector of A itself.
 */
export function factorBanded(matrix: BandedSymmetricMatrix, tolerance = DEFAULT_PIVOT_TOLERANCE): Factorization {
  const n = matrix.size;
  const w = matrix.halfBandwidth;
  const stride = w + 1;
  const a = Float64Array.from(matrix.values);
  for (let j = 0; j < n; j++) {
    const rowJ = j * stride + w;
    const original = a[rowJ]!;
    let d = original;
    const k0 = Math.max(0, j - w);
    for (let k = k0; k < j; k++) {
      const ljk = a[rowJ - (j - k)]!;
      d -= ljk * ljk * a[k * stride + w]!;
    }
    if (!(d > tolerance * Math.abs(original))) {
      return { ok: false, singularDof: j, mode: nullVector(a, n, w, j) };
    }
    a[rowJ] = d;
    const iEnd = Math.min(n - 1, j + w);
    for (let i = j + 1; i <= iEnd; i++) {
      const rowI = i * stride + w;
      let s = a[rowI - (i - j)]!;
      const kStart = Math.max(0, i - w);
      for (let k = kStart; k < j; k++) s -= a[rowI - (i - k)]! * a[rowJ - (j - k)]! * a[k * stride + w]!;
      a[rowI - (i - j)] = s / d;
    }
  }
  return { ok: true, factors: { size: n, halfBandwidth: w, values: a } };
}

function nullVector(a: Float64Array, n: number, w: number, j: number): Float64Array {
  const stride = w + 1;
  const z = new Float64Array(n);
  z[j] = 1;
  for (let k = j - 1; k >= 0; k--) {
    let s = 0;
    const iEnd = Math.min(j, k + w);
    for (let i = k + 1; i <= iEnd; i++) s += a[i * stride + w - (i - k)]! * z[i]!;
    z[k] = -s;
  }
  return z;
}

/** Solves A·x = b in place (b becomes x) with factors from `factorBanded`. */
export function solveFactored(factors: BandedSymmetricMatrix, b: Float64Array): void {
  const n = factors.size;
  const w = factors.halfBandwidth;
  const stride = w + 1;
  const a = factors.values;
  for (let i = 0; i < n; i++) {
    let s = b[i]!;
    const row = i * stride + w;
    for (let k = Math.max(0, i - w); k < i; k++) s -= a[row - (i - k)]! * b[k]!;
    b[i] = s;
  }
  for (let i = 0; i < n; i++) b[i]! /= a[i * stride + w]!;
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    const kEnd = Math.min(n - 1, i + w);
    for (let k = i + 1; k <= kEnd; k++) s -= a[k * stride + w - (k - i)]! * b[k]!;
    b[i] = s;
  }
}

/** y = A·x for the (unfactored) band matrix; used to check residuals. */
export function multiplyBanded(m: BandedSymmetricMatrix, x: ArrayLike<number>): Float64Array {
  const y = new Float64Array(m.size);
  for (let i = 0; i < m.size; i++) {
    for (let j = Math.max(0, i - m.halfBandwidth); j <= i; j++) {
      const v = m.values[index(m, i, j)]!;
      y[i]! += v * x[j]!;
      if (j !== i) y[j]! += v * x[i]!;
    }
  }
  return y;
}
