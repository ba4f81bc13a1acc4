import { LuDecomposition, Matrix } from "ml-matrix";
import { describe, expect, it } from "vitest";
import { addToBanded, createBandedMatrix, factorBanded, getBanded, multiplyBanded, solveFactored } from "./bandedMatrix.js";

/** Deterministic generator so a failure reproduces (Park-Miller minimal standard). */
function seeded(seed: number): () => number {
  let s = seed;
  return () => {
    s = (s * 48271) % 2147483647;
    return s / 2147483647;
  };
}

function randomSpdBand(n: number, w: number, seed: number) {
  const random = seeded(seed);
  const band = createBandedMatrix(n, w);
  const dense = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    for (let j = Math.max(0, i - w); j < i; j++) {
      const v = random() * 2 - 1;
      addToBanded(band, i, j, v);
      dense.set(i, j, v);
      dense.set(j, i, v);
    }
  }
  // Diagonal dominance makes it positive definite; scale rows widely to test the relative pivot test.
  for (let i = 0; i < n; i++) {
    const v = 2 * w + 1 + random();
    addToBanded(band, i, i, v);
    dense.set(i, i, v);
  }
  return { band, dense, random };
}

describe("banded LDLᵀ solver", () => {
  it.each([
    { n: 1, w: 0, seed: 1 },
    { n: 8, w: 1, seed: 2 },
    { n: 30, w: 3, seed: 3 },
    { n: 50, w: 4, seed: 4 },
    { n: 5, w: 7, seed: 5 },
  ])("matches ml-matrix dense LU on a random SPD band matrix (n=$n, w=$w)", ({ n, w, seed }) => {
    const { band, dense, random } = randomSpdBand(n, w, seed);
    const b = Float64Array.from({ length: n }, () => random() * 10 - 5);
    const expected = new LuDecomposition(dense).solve(Matrix.columnVector(Array.from(b))).getColumn(0);
    const factored = factorBanded(band);
    expect(factored.ok).toBe(true);
    if (!factored.ok) return;
    const x = Float64Array.from(b);
    solveFactored(factored.factors, x);
    x.forEach((v, i) => expect(v).toBeCloseTo(expected[i]!, 10));
    const residual = multiplyBanded(band, x).map((v, i) => v - b[i]!);
    expect(Math.max(...residual.map(Math.abs))).toBeLessThan(1e-12);
  });

  it("keeps the original matrix intact and mirrors entries", () => {
    const m = createBandedMatrix(3, 1);
    addToBanded(m, 0, 1, 2);
    addToBanded(m, 0, 0, 5);
    expect(getBanded(m, 1, 0)).toBe(2);
    expect(getBanded(m, 2, 0)).toBe(0);
    factorBanded(m);
    expect(getBanded(m, 0, 0)).toBe(5);
  });

  it("rejects an entry outside the band", () => {
    expect(() => addToBanded(createBandedMatrix(4, 1), 0, 2, 1)).toThrow(RangeError);
  });

  it("reports a singular matrix with its null vector (relative pivot test, not === 0)", () => {
    // The stiffness of a free spring chain 1–2–3 with scaled stiffness: singular, null vector (1,1,1).
    const k = 3.7e9;
    const m = createBandedMatrix(3, 1);
    for (const [i, j] of [
      [0, 1],
      [1, 2],
    ] as const) {
      addToBanded(m, i, i, k);
      addToBanded(m, j, j, k);
      addToBanded(m, i, j, -k);
    }
    const result = factorBanded(m);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.singularDof).toBe(2);
    Array.from(result.mode).forEach((v) => expect(v).toBeCloseTo(1, 12));
    expect(Math.max(...multiplyBanded(m, result.mode).map(Math.abs)) / k).toBeLessThan(1e-12);
  });
});
