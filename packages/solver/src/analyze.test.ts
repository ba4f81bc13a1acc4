import { describe, expect, it } from "vitest";
import { analyzeModel } from "./analyze.js";
import { assembleStiffness, segmentSections } from "./assembleStiffness.js";
import { multiplyBanded } from "./bandedMatrix.js";
import type { BeamModel, BeamModelInput } from "./beamModelSchema.js";
import { beamModelSchema } from "./beamModelSchema.js";
import { numberDofs } from "./numberDofs.js";
import { solve } from "./solve.js";

const E = 2e11;
const I = 8e-5;
const EI = E * I;

function model(input: Omit<BeamModelInput, "format">): BeamModel {
  return beamModelSchema.parse({ format: "spanwright.beam/1", ...input });
}

function relClose(got: number, expected: number, scale: number, rel = 1e-10) {
  expect(Math.abs(got - expected)).toBeLessThanOrEqual(rel * Math.max(Math.abs(expected), scale));
}

describe("analyzeModel: hand-checkable cases", () => {
  it("simply supported beam under uniform load: R = wL/2, M = wL²/8 at midspan, uy = −5wL⁴/384EI (AISC Manual Table 3-23 case 1; AWC Beam Design Formulas fig. 1)", () => {
    const w = 10e3;
    const L = 8;
    const out = solve({
      format: "spanwright.beam/1",
      nodes: [{ x: 0, support: { type: "pinned" } }, { x: L, support: { type: "pinned" } }],
      segments: [{ E, I }],
      loadCases: [{ id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: L, qy1: -w, qy2: -w }] }],
      stations: [L / 2],
    });
    const r = out.results.D!;
    relClose(r.reactions[0]!.fy, (w * L) / 2, w * L);
    relClose(r.stations[0]!.M, (w * L * L) / 8, w * L * L);
    relClose(r.extremes.Mmax.value, (w * L * L) / 8, w * L * L);
    relClose(r.extremes.Mmax.x, L / 2, L);
    relClose(r.extremes.uyMin.value, (-5 * w * L ** 4) / (384 * EI), (w * L ** 4) / EI);
  });

  it("cantilever with a tip load: M = −PL at the support, uy = −PL³/3EI at the tip (AISC Manual Table 3-23 case 22)", () => {
    const P = 5e3;
    const L = 3;
    const out = solve({
      format: "spanwright.beam/1",
      nodes: [{ x: 0, support: { type: "fixed" } }, { x: 1.2 }, { x: L }],
      segments: [{ E, I }, { E, I }],
      loadCases: [{ id: "P", category: "live", loads: [{ type: "point", x: L, fy: -P }] }],
    });
    const r = out.results.P!;
    relClose(r.reactions[0]!.fy, P, P);
    relClose(r.reactions[0]!.mz, P * L, P * L); // CCW moment from the wall holds the tip load down
    relClose(r.extremes.Mmin.value, -P * L, P * L);
    relClose(r.nodes[2]!.uy, (-P * L ** 3) / (3 * EI), (P * L ** 3) / EI);
  });

  it("Timoshenko cantilever tip deflection PL³/3EI + PL/κGA (Timoshenko & Gere, Mechanics of Materials; from memory)", () => {
    const P = 20e3;
    const L = 1.2;
    const section = { E, I, A: 7.6e-3, G: 7.7e10, shearFactor: 0.45 };
    const out = solve({
      format: "spanwright.beam/1",
      theory: "timoshenko",
      nodes: [{ x: 0, support: { type: "fixed" } }, { x: L }],
      segments: [section],
      loadCases: [{ id: "P", category: "live", loads: [{ type: "point", x: L, fy: -P }] }],
    });
    const expected = -((P * L ** 3) / (3 * EI) + (P * L) / (section.shearFactor * section.G * section.A));
    relClose(out.results.P!.nodes[1]!.uy, expected, Math.abs(expected));
  });

  it("a settlement of a middle support of a two-span beam gives R = 6EIδ/L³ there (δ = P(2L)³/48EI for a central load on the 2L beam, AISC Manual Table 3-23 case 7)", () => {
    const L = 5;
    const delta = -0.01;
    const out = solve({
      format: "spanwright.beam/1",
      nodes: [0, L, 2 * L].map((x) => ({ x, support: { type: "pinned" as const } })),
      segments: [{ E, I }, { E, I }],
      loadCases: [{ id: "S", category: "settlement", loads: [{ type: "settlement", node: 1, uy: delta }] }],
    });
    const r = out.results.S!;
    const R = (6 * EI * delta) / L ** 3;
    relClose(r.reactions[1]!.fy, R, Math.abs(R));
    relClose(r.nodes[1]!.uy, delta, Math.abs(delta));
    relClose(r.reactions[0]!.fy + r.reactions[1]!.fy + r.reactions[2]!.fy, 0, Math.abs(R));
  });

  it("a hinge releases the moment: M = 0 at the hinge and rotations differ either side", () => {
    const out = solve({
      format: "spanwright.beam/1",
      nodes: [{ x: 0, support: { type: "fixed" } }, { x: 4, hinge: true }, { x: 7, support: { type: "pinned" } }],
      segments: [{ E, I }, { E, I }],
      loadCases: [{ id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 7, qy1: -2e3, qy2: -2e3 }] }],
      stations: [4],
    });
    const r = out.results.D!;
    relClose(r.stations[0]!.M, 0, 2e3 * 49);
    const node = r.nodes[1] as { rzLeft: number; rzRight: number };
    expect(Math.abs(node.rzLeft - node.rzRight)).toBeGreaterThan(1e-6);
    // The drop-in part 4–7 m is statically determinate: the pin carries wL/2 = 3 kN.
    relClose(r.reactions[1]!.fy, 3e3, 3e3);
  });
});

describe("analyzeModel: algebra", () => {
  it.each([
    { name: "continuous beam with a spring and a hinge", theory: "euler-bernoulli" as const },
    { name: "the same beam as Timoshenko", theory: "timoshenko" as const },
  ])("K·u − f is near zero ($name)", ({ theory }) => {
    const section = { E, I, A: 7.6e-3, G: 7.7e10, shearFactor: 0.45 };
    const m = model({
      theory,
      nodes: [
        { x: 0, support: { type: "pinned" } },
        { x: 5, support: { type: "pinned" } },
        { x: 7.5, hinge: true },
        { x: 11, support: { type: "spring", ky: 5e7, kr: 1e6 } },
      ],
      segments: [section, section, section],
      loadCases: [{ id: "D", category: "dead", loads: [{ type: "point", x: 5, fy: -4e3 }, { type: "moment", x: 7.5, mz: 2e3 }, { type: "point", x: 11, fy: -1e3 }] }],
    });
    const analysis = analyzeModel(m);
    expect(analysis.ok).toBe(true);
    if (!analysis.ok) return;
    const dofs = numberDofs(m);
    const { stiffness } = assembleStiffness(m, dofs, segmentSections(m));
    const curve = analysis.value.cases[0]!.curve;
    const u = new Float64Array(dofs.count);
    for (let i = 0; i < m.nodes.length; i++) {
      if (dofs.uy[i]! >= 0) u[dofs.uy[i]!] = curve.uy[i]!;
      if (dofs.rzLeft[i]! >= 0) u[dofs.rzLeft[i]!] = curve.rzLeft[i]!;
      if (dofs.rzRight[i]! >= 0) u[dofs.rzRight[i]!] = curve.rzRight[i]!;
    }
    // Only nodal loads here, so f holds them directly on the free DOFs.
    const f = new Float64Array(dofs.count);
    f[dofs.uy[3]!] = -1e3;
    f[dofs.rzRight[2]!] = 2e3;
    const residual = multiplyBanded(stiffness, u).map((v, i) => v - f[i]!);
    expect(Math.max(...residual.map(Math.abs))).toBeLessThan(1e-9 * 4e3);
  });

  it("reactions balance the loads in force and in moment about x = 0", () => {
    const loads = [
      { type: "distributed" as const, x1: 1, x2: 9, qy1: -3e3, qy2: -1e3 },
      { type: "point" as const, x: 6, fy: -7e3 },
      { type: "moment" as const, x: 2.5, mz: 4e3 },
    ];
    const out = solve({
      format: "spanwright.beam/1",
      nodes: [{ x: 0, support: { type: "fixed" } }, { x: 4, support: { type: "pinned" } }, { x: 9, support: { type: "spring", ky: 2e7 } }],
      segments: [{ E, I }, { E, I }],
      loadCases: [{ id: "D", category: "dead", loads }],
    });
    const r = out.results.D!.reactions;
    const xs = [0, 4, 9];
    // Trapezoid 1–9 m: resultant and its moment about 0 by integrating q(x) = −3e3 + 250(x − 1).
    const Fq = -16e3;
    const Mq = -3e3 * (81 - 1) / 2 + 250 * ((9 ** 3 - 1) / 3 - (81 - 1) / 2);
    const sumFy = r.reduce((s, q) => s + q.fy, 0) + Fq - 7e3;
    const sumM = r.reduce((s, q, i) => s + q.fy * xs[i]! + q.mz, 0) + Mq + -7e3 * 6 + 4e3;
    expect(Math.abs(sumFy)).toBeLessThan(1e-9 * 23e3);
    expect(Math.abs(sumM)).toBeLessThan(1e-9 * 23e3 * 9);
  });
});

describe("analyzeModel: fixtures of fixed precision bugs", () => {
  it("a short stiff piece next to a long cantilever keeps full precision (iterative refinement, statics from the free end)", () => {
    // Found by the segment-splitting property: splitting 0–1.5 m at 0.09 m changed uy at the tip by 2.6e-9 relative.
    const shape = {
      nodes: [{ x: 0 }, { x: 1.5 }, { x: 8.5 }, { x: 10, support: { type: "guided" } }, { x: 10.875, hinge: true }, { x: 12.5, support: { type: "spring", ky: 1e8 } }, { x: 22, support: { type: "pinned" } }, { x: 29.5 }],
      segments: [2.83e-4, 1.1e-5, 2.84e-4, 3.94e-4, 2.92e-4, 1.8e-5].map((I) => ({ E: 2e11, I })).concat([{ E: 1.2e10, I: 1.258e-3 }]),
    };
    const loadCases = [{ id: "A", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 0.002, qy1: 0, qy2: -1000 }] }];
    const stations = [0, 1.5, 8.5, 10, 12.5, 22, 29.5];
    const whole = solve({ format: "spanwright.beam/1", ...shape, loadCases, stations }).results.A!;
    const split = solve({
      format: "spanwright.beam/1",
      nodes: [shape.nodes[0], { x: 0.09 }, ...shape.nodes.slice(1)],
      segments: [shape.segments[0], ...shape.segments],
      loadCases,
      stations,
    }).results.A!;
    whole.stations.forEach((s, i) => {
      const t = split.stations[i]!;
      relClose(t.uy, s.uy, 1e-4, 1e-11);
      relClose(t.rz, s.rz, 1e-5, 1e-11);
      relClose(t.V, s.V, 1, 1e-11);
      relClose(t.M, s.M, 10, 1e-11);
    });
  });
});
