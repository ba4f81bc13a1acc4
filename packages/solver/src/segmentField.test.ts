import { Matrix } from "ml-matrix";
import { describe, expect, it } from "vitest";
import { elementStiffness } from "./elementStiffness.js";
import type { BasisLoads, LoadGrid } from "./loadGrid.js";
import { equivalentNodalLoads, marchSegment, solveStartForces } from "./segmentField.js";

/** One segment of length L on a grid with an optional interior breakpoint at a. */
function oneSegment(L: number, a?: number): LoadGrid {
  const x = a === undefined ? [0, L] : [0, a, L];
  return {
    x: Float64Array.from(x),
    pointNode: Int32Array.from(x.map((_, j) => (j === 0 ? 0 : j === x.length - 1 ? 1 : -1))),
    segmentFirstInterval: Int32Array.from([0, x.length - 1]),
    intervalSpan: new Int32Array(x.length - 1),
    pointSpan: new Int32Array(x.length),
    spans: [{ x1: 0, x2: L }],
  };
}

function loads(grid: LoadGrid, edit: (b: BasisLoads) => void): BasisLoads {
  const K = grid.x.length - 1;
  const basis = { caseIndex: 0, span: -1, q0: new Float64Array(K), q1: new Float64Array(K), fy: new Float64Array(K + 1), mz: new Float64Array(K + 1), settlements: [] };
  edit(basis);
  return basis;
}

function particularOf(grid: LoadGrid, basis: BasisLoads, section: { EI: number; shearFlexibility: number }) {
  const state = new Float64Array(4);
  marchSegment(grid, basis, 0, section, state);
  return state;
}

const L = 6;
const EI = 1.6e7;

describe("equivalentNodalLoads (fixed-end reactions negated)", () => {
  it.each([
    {
      name: "uniform load: −wL/2, −wL²/12, −wL/2, +wL²/12 (common practice; AISC Manual Table 3-23 case 15)",
      a: undefined,
      edit: (b: BasisLoads) => (b.q0[0] = -1000),
      expected: [-3000, -3000, -3000, 3000],
    },
    {
      name: "central point load: −P/2, −PL/8, −P/2, +PL/8 (AISC Manual Table 3-23 case 16)",
      a: 3,
      edit: (b: BasisLoads) => (b.fy[1] = -8000),
      expected: [-4000, -6000, -4000, 6000],
    },
    {
      name: "triangular load rising to w: −3wL/20, −wL²/30, −7wL/20, +wL²/20 (common practice, from memory)",
      a: undefined,
      edit: (b: BasisLoads) => (b.q1[0] = -1000 / L),
      expected: [-900, -1200, -2100, 1800],
    },
  ])("$name", ({ a, edit, expected }) => {
    const grid = oneSegment(L, a);
    const section = { EI, shearFlexibility: 0 };
    const out = new Float64Array(4);
    equivalentNodalLoads(L, section, particularOf(grid, loads(grid, edit), section), out);
    Array.from(out).forEach((v, i) => expect(v).toBeCloseTo(expected[i]!, 6));
  });
});

describe("solveStartForces", () => {
  it.each([
    { name: "Euler-Bernoulli", shearStiffness: undefined },
    { name: "Timoshenko", shearStiffness: 2e8 },
  ])("gives the element end forces K·u for end displacements without span loads ($name)", ({ shearStiffness }) => {
    const section = { EI, shearFlexibility: shearStiffness ? 1 / shearStiffness : 0 };
    const u = [0.002, -0.001, -0.004, 0.0005];
    const K = elementStiffness(shearStiffness ? { length: L, EI, shearStiffness } : { length: L, EI });
    const forces = K.mmul(Matrix.columnVector(u)).getColumn(0);
    const { V0, M0 } = solveStartForces(L, section, new Float64Array(4), u[0]!, u[1]!, u[2]!, u[3]!);
    // Forces on the element at its left end: V₀ upward, and a CCW end moment −M₀ (M sagging positive).
    expect(V0).toBeCloseTo(forces[0]!, 6);
    expect(-M0).toBeCloseTo(forces[1]!, 6);
  });

  it("marches to the prescribed far-end displacements", () => {
    const grid = oneSegment(L, 2);
    const section = { EI, shearFlexibility: 1 / 3e8 };
    const basis = loads(grid, (b) => {
      b.q0[0] = -2000;
      b.q1[1] = 300;
      b.fy[1] = -5000;
      b.mz[1] = 1200;
    });
    const particular = particularOf(grid, basis, section);
    const { V0, M0 } = solveStartForces(L, section, particular, 0.001, 0.0002, -0.003, 0.0004);
    const state = Float64Array.from([V0, M0, 0.0002, 0.001]);
    marchSegment(grid, basis, 0, section, state);
    expect(state[2]).toBeCloseTo(0.0004, 14);
    expect(state[3]).toBeCloseTo(-0.003, 14);
  });
});
