// Small dense polynomials in power form, c[0] + c[1] u + c[2] u² + …, stored in a slice of a
// Float64Array (offset, degree) so the hot paths allocate nothing per evaluation.

/** Evaluates the polynomial of `degree` stored at `coef[offset..offset+degree]` at u (Horner). */
export function evaluatePolynomial(coef: ArrayLike<number>, offset: number, degree: number, u: number): number {
  let value = coef[offset + degree]!;
  for (let k = degree - 1; k >= 0; k--) value = value * u + coef[offset + k]!;
  return value;
}

/** Writes the derivative of the polynomial into `out` (degree − 1 coefficients). */
function differentiate(coef: ArrayLike<number>, offset: number, degree: number, out: Float64Array): void {
  for (let k = 1; k <= degree; k++) out[k - 1] = k * coef[offset + k]!;
}

/**
 * Work arrays per polynomial degree, reused: the recursion below reads a degree-d polynomial,
 * writes its derivative into the degree-d derivative array and the derivative's sign changes into
 * the degree-d critical-point array, and recurses on degree d − 1, so no two live calls share one.
 * This runs for every interval of every curve and every pattern piece, where allocating arrays cost
 * more than the arithmetic (and their collection made the large solves' timings uneven).
 */
const derivatives: Float64Array[] = [];
const criticals: Float64Array[] = [];

/**
 * The real roots strictly inside (lo, hi) where the polynomial changes sign, ascending, written
 * into `out` (length ≥ degree, not `coef`) from index 0; returns how many there are. Isolation by
 * recursion on the derivative (between consecutive critical points the polynomial is monotone, so
 * each sign change holds exactly one root), then safeguarded regula falsi (Illinois) to full double
 * precision. Roots without a sign change (even multiplicity) are skipped on purpose: callers use
 * them to find extremes and sign changes, where they do not count. Allocates nothing.
 */
export function signChangesInto(coef: ArrayLike<number>, offset: number, degree: number, lo: number, hi: number, out: Float64Array): number {
  let d = degree;
  while (d > 0 && coef[offset + d] === 0) d--;
  if (d <= 0 || !(hi > lo)) return 0;
  if (d === 1) {
    const root = -coef[offset]! / coef[offset + 1]!;
    if (!(root > lo && root < hi)) return 0;
    out[0] = root;
    return 1;
  }
  if (d === 2) return quadraticSignChanges(coef[offset]!, coef[offset + 1]!, coef[offset + 2]!, lo, hi, out);
  const derivative = (derivatives[d] ??= new Float64Array(d));
  const critical = (criticals[d] ??= new Float64Array(d));
  differentiate(coef, offset, d, derivative);
  const nCritical = signChangesInto(derivative, 0, d - 1, lo, hi, critical);
  let count = 0;
  let a = lo;
  let fa = evaluatePolynomial(coef, offset, d, a);
  for (let i = 0; i <= nCritical; i++) {
    const b = i < nCritical ? critical[i]! : hi;
    const fb = evaluatePolynomial(coef, offset, d, b);
    if ((fa < 0 && fb > 0) || (fa > 0 && fb < 0)) out[count++] = refineRoot(coef, offset, d, a, fa, b, fb);
    a = b;
    fa = fb;
  }
  return count;
}

/** Roots of c + b·u + a·u² in (lo, hi) into `out`, by the cancellation-free form of the quadratic formula. */
function quadraticSignChanges(c: number, b: number, a: number, lo: number, hi: number, out: Float64Array): number {
  const discriminant = b * b - 4 * a * c;
  if (!(discriminant > 0)) return 0;
  const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(discriminant));
  const r1 = q / a;
  const r2 = q !== 0 ? c / q : r1;
  const first = Math.min(r1, r2);
  const second = Math.max(r1, r2);
  let count = 0;
  if (first > lo && first < hi) out[count++] = first;
  if (second > lo && second < hi) out[count++] = second;
  return count;
}

function refineRoot(coef: ArrayLike<number>, offset: number, degree: number, a: number, fa: number, b: number, fb: number): number {
  let side = 0;
  let x = a;
  for (let iteration = 0; iteration < 200; iteration++) {
    x = (a * fb - b * fa) / (fb - fa);
    if (!(x > a && x < b)) x = 0.5 * (a + b);
    const fx = evaluatePolynomial(coef, offset, degree, x);
    if (fx === 0 || b - a <= 4e-16 * Math.max(Math.abs(a), Math.abs(b), 1e-300)) return x;
    if ((fx > 0) === (fb > 0)) {
      b = x;
      fb = fx;
      if (side === -1) fa *= 0.5;
      side = -1;
    } else {
      a = x;
      fa = fx;
      if (side === 1) fb *= 0.5;
      side = 1;
    }
  }
  return x;
}

const shifted: Float64Array[] = [];

/**
 * A bound of the polynomial on [lo, hi] from its Taylor coefficients at lo: for t in [0, hi − lo]
 * every tʲ ≥ 0, so d₀ + Σ max(0, dⱼtʲ) bounds it from above (with min, from below). Cheap, exact
 * at lo, loose on wide intervals: a filter before the exact search, not a value.
 */
export function taylorBound(coef: ArrayLike<number>, offset: number, degree: number, lo: number, hi: number, upper: boolean): number {
  const d = (shifted[degree] ??= new Float64Array(degree + 1));
  for (let i = 0; i <= degree; i++) d[i] = coef[offset + i]!;
  for (let i = 0; i < degree; i++) for (let j = degree - 1; j >= i; j--) d[j]! += lo * d[j + 1]!;
  const w = hi - lo;
  let bound = d[0]!;
  let power = 1;
  for (let j = 1; j <= degree; j++) {
    power *= w;
    const term = d[j]! * power;
    bound += upper ? Math.max(0, term) : Math.min(0, term);
  }
  return bound;
}
