import { describe, expect, it } from "vitest";
import { evaluatePolynomial, signChangesInto, taylorBound } from "./polynomial.js";

/** The roots signChangesInto writes, as an array. */
function findSignChanges(coef: number[], offset: number, degree: number, lo: number, hi: number): number[] {
  const out = new Float64Array(degree);
  return Array.from(out.subarray(0, signChangesInto(coef, offset, degree, lo, hi, out)));
}

describe("evaluatePolynomial", () => {
  it.each([
    { coef: [1, 2, 3], u: 2, expected: 17 },
    { coef: [0, 0, 0, 1], u: -3, expected: -27 },
    { coef: [5], u: 100, expected: 5 },
  ])("evaluates $coef at $u", ({ coef, u, expected }) => {
    expect(evaluatePolynomial(coef, 0, coef.length - 1, u)).toBe(expected);
  });

  it("reads a slice at an offset", () => {
    expect(evaluatePolynomial([9, 9, 1, 1], 2, 1, 4)).toBe(5);
  });
});

describe("findSignChanges", () => {
  it.each([
    { name: "linear", coef: [-1, 2], lo: 0, hi: 1, roots: [0.5] },
    { name: "quadratic with two roots", coef: [2, -3, 1], lo: 0, hi: 3, roots: [1, 2] },
    { name: "cubic (u-1)(u-2)(u-3)", coef: [-6, 11, -6, 1], lo: 0, hi: 4, roots: [1, 2, 3] },
    { name: "quintic (u²-2)(u-0.5)u(u+1)", coef: [0, 1, 2.5, -2.5, -0.5, 1].map((c) => c), lo: -3, hi: 3, roots: null },
    { name: "double root has no sign change", coef: [1, -2, 1], lo: 0, hi: 2, roots: [] },
    { name: "roots outside the interval are ignored", coef: [-6, 11, -6, 1], lo: 1.5, hi: 2.5, roots: [2] },
  ])("finds the roots of a $name polynomial", ({ coef, lo, hi, roots }) => {
    const found = findSignChanges(coef, 0, coef.length - 1, lo, hi);
    if (roots === null) {
      for (const r of found) expect(Math.abs(evaluatePolynomial(coef, 0, coef.length - 1, r))).toBeLessThan(1e-12);
      return;
    }
    expect(found).toHaveLength(roots.length);
    found.forEach((r, i) => expect(r).toBeCloseTo(roots[i]!, 12));
  });

  it("finds all five roots of a quintic with known roots", () => {
    // (u+2)(u+1)u(u-1)(u-2) = u^5 - 5u^3 + 4u
    const found = findSignChanges([0, 4, 0, -5, 0, 1], 0, 5, -2.5, 2.5);
    expect(found.map((r) => Math.round(r * 1e9) / 1e9)).toEqual([-2, -1, 0, 1, 2]);
  });
});

describe("taylorBound", () => {
  it("bounds a polynomial on the interval from above and below, and equals it for a constant", () => {
    const coef = [0, 4, -1]; // greatest value 4 at u = 2
    const samples = Array.from({ length: 301 }, (_, i) => evaluatePolynomial(coef, 0, 2, (3 * i) / 300));
    expect(taylorBound(coef, 0, 2, 0, 3, true)).toBeGreaterThanOrEqual(Math.max(...samples));
    expect(taylorBound(coef, 0, 2, 0, 3, false)).toBeLessThanOrEqual(Math.min(...samples));
    // from the left end: 0 + max(0, 4·3) + max(0, −9) = 12, loose but a bound
    expect(taylorBound(coef, 0, 2, 0, 3, true)).toBe(12);
    expect(taylorBound([5, 0, 0], 0, 2, -1, 1, true)).toBe(5);
  });

  it("is exact at the interval's left end when the interval is a point", () => {
    expect(taylorBound([1, 2, 3], 0, 2, 2, 2, true)).toBe(evaluatePolynomial([1, 2, 3], 0, 2, 2));
  });
});
