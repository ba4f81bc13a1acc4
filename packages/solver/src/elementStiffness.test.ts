import { EigenvalueDecomposition, LuDecomposition, Matrix } from "ml-matrix";
import { describe, expect, it } from "vitest";
import { elementStiffness, shearParameter } from "./elementStiffness.js";

const cases = [
  { name: "Euler-Bernoulli", props: { length: 4, EI: 2e11 * 8e-5 } },
  { name: "Timoshenko", props: { length: 1.5, EI: 2e11 * 8e-5, shearStiffness: 0.45 * 7.7e10 * 7.6e-3 } },
];

describe("elementStiffness", () => {
  it.each(cases)("is symmetric ($name)", ({ props }) => {
    const K = elementStiffness(props);
    expect(K.isSymmetric()).toBe(true);
  });

  it.each(cases)("has the two rigid-body modes in its null space ($name)", ({ props }) => {
    const K = elementStiffness(props);
    const L = props.length;
    const translation = Matrix.columnVector([1, 0, 1, 0]);
    const rotation = Matrix.columnVector([0, 1, L, 1]); // uy = x, rz = 1 about node 1
    const scale = K.max();
    expect(K.mmul(translation).norm("max") / scale).toBeLessThan(1e-14);
    expect(K.mmul(rotation).norm("max") / scale).toBeLessThan(1e-14);
  });

  it.each(cases)("is positive semidefinite of rank 2 ($name)", ({ props }) => {
    const values = new EigenvalueDecomposition(elementStiffness(props)).realEigenvalues.sort((p, q) => p - q);
    expect(Math.abs(values[0]!) / values[3]!).toBeLessThan(1e-12);
    expect(Math.abs(values[1]!) / values[3]!).toBeLessThan(1e-12);
    expect(values[2]!).toBeGreaterThan(0);
  });

  it("matches the textbook Hermite-cubic matrix EI/L³[12 6L −12 6L; …] (common practice)", () => {
    const K = elementStiffness({ length: 2, EI: 8 });
    // EI/L³ = 1, L = 2
    expect(K.to2DArray()).toEqual([
      [12, 12, -12, 12],
      [12, 16, -12, 8],
      [-12, -12, 12, -12],
      [12, 8, -12, 16],
    ]);
  });

  it("gives the cantilever tip deflection PL³/3EI + PL/κGA (Timoshenko, Gere & Timoshenko)", () => {
    const props = { length: 2, EI: 1e6, shearStiffness: 5e6 };
    const K = elementStiffness(props);
    // Node 1 clamped: solve the 2×2 block of node 2 for a tip force P.
    const P = -1000;
    const block = K.subMatrix(2, 3, 2, 3);
    const u = new LuDecomposition(block).solve(Matrix.columnVector([P, 0]));
    const expected = (P * 8) / (3 * 1e6) + (P * 2) / 5e6;
    expect(u.get(0, 0) / expected).toBeCloseTo(1, 13);
    expect(shearParameter(props)).toBeCloseTo((12 * 1e6) / (5e6 * 4), 15);
  });
});
