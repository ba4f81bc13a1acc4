import { describe, expect, it } from "vitest";
import { sectionProfile, type SectionProfile } from "./sectionProfile.js";

const E = 200e9, G = 77e9;

function profile(...args: Parameters<typeof sectionProfile>): SectionProfile {
  const r = sectionProfile(...args);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe("section profile for the section view", () => {
  const tee = { kind: "tee", d: 0.12, bf: 0.1, tf: 0.02, tw: 0.01 };

  it("extreme fibre stresses equal M·c/I (tee: I = 3.3e-6 m⁴, c = 30 mm top, 90 mm bottom)", () => {
    const M = 5e3;
    const p = profile(tee, M, 0, E);
    expect(p.top.stress).toBeCloseTo((-M * 0.03) / 3.3e-6, 0);
    expect(p.bottom.stress).toBeCloseTo((M * 0.09) / 3.3e-6, 0);
  });

  it("strain is linear through the depth, zero at the neutral axis, ε = −y·M/(EI)", () => {
    const p = profile({ kind: "rectangle", b: 0.2, h: 0.5 }, 100e3, 0, 30e9);
    const kappa = 100e3 / (30e9 * ((0.2 * 0.5 ** 3) / 12));
    expect(p.curvature).toBeCloseTo(kappa, 15);
    for (const q of p.points) {
      expect(q.strain).toBeCloseTo(-q.y * kappa, 15);
      expect(q.stress).toBeCloseTo(30e9 * q.strain, 3);
    }
    const na = p.points.find((q) => Math.abs(q.y) < 1e-12);
    expect(na?.strain).toBeCloseTo(0, 15);
  });

  it("shear stress is parabolic in a rectangle: 1.5·V/A at the axis, zero at the fibres", () => {
    const V = 60e3, A = 0.1;
    const p = profile({ kind: "rectangle", b: 0.2, h: 0.5 }, 0, V, E);
    expect(p.shearStressAtNeutralAxis).toBeCloseTo((1.5 * V) / A, 6);
    const first = p.points[0], last = p.points[p.points.length - 1];
    expect(first?.shearStress).toBeCloseTo(0, 9);
    expect(last?.shearStress).toBeCloseTo(0, 9);
    const peak = Math.max(...p.points.map((q) => q.shearStress ?? 0));
    expect(peak).toBeCloseTo((1.5 * V) / A, 6);
  });

  it("I-shape web shear stress at the axis is V·Q/(I·tw) and jumps down into the flange", () => {
    const shape = { kind: "i-shape", d: 0.4, bf: 0.18, tf: 0.014, tw: 0.009 };
    const p = profile(shape, 0, 100e3, E);
    const atFlangeUnderside = p.points.filter((q) => Math.abs(q.s - 0.014) < 1e-12);
    expect(atFlangeUnderside[0]?.width).toBeCloseTo(0.009, 12);
    expect(p.shearStressAtNeutralAxis).toBeGreaterThan(atFlangeUnderside[0]?.shearStress ?? Infinity);
  });

  it("Timoshenko shear strain is −V/(κs·G·A), with κs = 5/6 for a rectangle unless given", () => {
    const p = profile({ kind: "rectangle", b: 0.2, h: 0.5 }, 0, 60e3, E, G);
    expect(p.shearStrain).toBeCloseTo(-60e3 / ((5 / 6) * G * 0.1), 15);
    const q = profile({ kind: "rectangle", b: 0.2, h: 0.5 }, 0, 60e3, E, G, 0.9);
    expect(q.shearStrain).toBeCloseTo(-60e3 / (0.9 * G * 0.1), 15);
    expect(profile({ kind: "rectangle", b: 0.2, h: 0.5 }, 0, 60e3, E).shearStrain).toBeNull();
  });

  it("custom sections give fibre stresses but no shear distribution", () => {
    const p = profile({ kind: "custom", A: 0.01, I: 1e-4, depth: 0.4 }, 10e3, 5e3, E);
    expect(p.top.stress).toBeCloseTo((-10e3 * 0.2) / 1e-4, 3);
    expect(p.points.every((q) => q.shearStress === null)).toBe(true);
    expect(p.shearStressAtNeutralAxis).toBeNull();
  });

  it("invalid input is an error naming the field", () => {
    const r = sectionProfile({ kind: "rectangle", b: 0.2, h: 0.5 }, 1, 1, 0);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.field).toBe("E");
  });
});
