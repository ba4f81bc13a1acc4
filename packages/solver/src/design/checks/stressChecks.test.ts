import { describe, expect, it } from "vitest";
import { propertiesOfValidShape } from "../sections/sectionProperties.js";
import { checkBendingStress, checkShearStress, extremeFibreStresses } from "./stressChecks.js";

describe("elastic bending stress σ = M·c/I", () => {
  it("rectangle 200 × 500 mm, M = 100 kN·m sagging: σ = M/S = 12 MPa, top in compression", () => {
    // S = bh²/6 = 0.2 × 0.25/6 = 8.333e-3 m³; σ = 100e3/8.333e-3 = 12.0 MPa.
    const { top, bottom } = extremeFibreStresses(100e3, (0.2 * 0.5 ** 3) / 12, 0.25, 0.5);
    expect(top).toBeCloseTo(-12e6, 3);
    expect(bottom).toBeCloseTo(12e6, 3);
    const r = checkBendingStress({ M: 100e3, I: (0.2 * 0.5 ** 3) / 12, yTop: 0.25, depth: 0.5, allowable: 10e6 });
    expect(r.utilisation).toBeCloseTo(1.2, 9);
    expect(r.status).toBe("fail");
  });

  it("tee (hand calc in sectionProperties.test): hogging −10 kN·m puts 10e3 × 0.09/3.3e-6 = 272.7 MPa compression in the stem tip", () => {
    const p = propertiesOfValidShape({ kind: "tee", d: 0.12, bf: 0.1, tf: 0.02, tw: 0.01, orientation: "flange-top" });
    const { top, bottom } = extremeFibreStresses(-10e3, p.I, p.yTop, p.depth);
    expect(top).toBeCloseTo((10e3 * 0.03) / 3.3e-6, 0);
    expect(bottom).toBeCloseTo((-10e3 * 0.09) / 3.3e-6, 0);
    const r = checkBendingStress({ M: -10e3, I: p.I, yTop: p.yTop, depth: p.depth, allowable: 300e6 });
    expect(r.demand).toBeCloseTo(272.73e6, -4);
  });
});

describe("elastic shear stress τ = V·Q/(I·b)", () => {
  it("rectangle: τmax = 1.5·V/A (any strength-of-materials text)", () => {
    const p = propertiesOfValidShape({ kind: "rectangle", b: 0.2, h: 0.5 });
    const r = checkShearStress({ V: 100e3, Q: p.Q!, I: p.I, b: p.bNA!, allowable: 2e6 });
    expect(r.demand).toBeCloseTo((1.5 * 100e3) / 0.1, 3);
    expect(r.pass).toBe(true);
  });

  it("solid circle: τmax = 4V/(3A)", () => {
    const p = propertiesOfValidShape({ kind: "circle", d: 0.1 });
    const r = checkShearStress({ V: -5e3, Q: p.Q!, I: p.I, b: p.bNA!, allowable: 1e6 });
    expect(r.demand).toBeCloseTo((4 * 5e3) / (3 * p.A), 3);
  });
});
