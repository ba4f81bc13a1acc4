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
 * One work array per derivative degree, reused: the recursion below reads a degree-d polynomial
 * and writes its derivative into the degree-(d − 1) array, so no two live calls share one. This
 * runs for every pattern piece on every interval, where allocating typed arrays cost more than
 * the arithmetic.
 */
const scratch: Float64Array[] = [];
function derivativeScratch(length: number): Float64Array {
  return (scratch[length] ??= new Float64Array(length));
}

/**
 * The real roots strictly inside (lo, hi) where the polynomial changes sign, ascending.
 * Isolation by recursion on the derivative (between consecutive critical points the polynomial
 * is monotone, so each sign change holds exactly one root), then safeguarded regula falsi
 * (Illinois) to full double precision. Roots without a sign change (even multiplicity) are
 * skipped on purpose: callers use them to find extremes and sign changes, where they do not count.
 */
export function findSignChanges(coef: ArrayLike<number>, offset: number, degree: number, lo: number, hi: number): number[] {
  let d = degree;
  while (d > 0 && coef[offset + d] === 0) d--;
  if (d <= 0 || !(hi > lo)) return [];
  if (d === 1) {
    const root = -coef[offset]! / coef[offset + 1]!;
    return root > lo && root < hi ? [root] : [];
  }
  if (d === 2) return quadraticSignChanges(coef[offset]!, coef[offset + 1]!, coef[offset + 2]!, lo, hi);
  const derivative = derivativeScratch(d);
  differentiate(coef, offset, d, derivative);
  const critical = findSignChanges(derivative, 0, d - 1, lo, hi);
  const roots: number[] = [];
  let a = lo;
  let fa = evaluatePolynomial(coef, offset, d, a);
  for (let i = 0; i <= critical.length; i++) {
    const b = i < critical.length ? critical[i]! : hi;
    const fb = evaluatePolynomial(coef, offset, d, b);
    if ((fa < 0 && fb > 0) || (fa > 0 && fb < 0)) roots.push(refineRoot(coef, offset, d, a, fa, b, fb));
    a = b;
    fa = fb;
  }
  return roots;
}

/** Roots of c + b·u + a·u² in (lo, hi), by the cancellation-free form of the quadratic formula. */
function quadraticSignChanges(c: number, b: number, a: number, lo: number, hi: number): number[] {
  const discriminant = b * b - 4 * a * c;
  if (!(discriminant > 0)) return [];
  const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(discriminant));
  const r1 = q / a;
  const r2 = q !== 0 ? c / q : r1;
  const roots = r1 < r2 ? [r1, r2] : [r2, r1];
  return roots.filter((r) => r > lo && r < hi);
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
