import { describe, expect, it } from "vitest";
import { shearShare, shearShareFromSolves, spanDepthHint } from "./shearShare.js";

// Rectangle 0.2 × 0.6 m, E = 30 GPa, G = 12.5 GPa, κ = 5/6.
const b = 0.2, h = 0.6, E = 30e9, G = 12.5e9;
const I = (b * h ** 3) / 12, As = (5 / 6) * b * h;

describe("share of deflection due to shear", () => {
  it("simple span UDL: matches 5wL⁴/(384EI) + wL²/(8κGA) evaluated directly", () => {
    const w = 20e3, L = 3;
    const db = (5 * w * L ** 4) / (384 * E * I), ds = (w * L ** 2) / (8 * G * As);
    const r = shearShare({ case: "simple-udl", L, depth: h, E, I, G, shearArea: As });
    expect(r.share).toBeCloseTo(ds / (db + ds), 12);
  });

  it("cantilever tip load: matches PL³/(3EI) + PL/(κGA)", () => {
    const P = 50e3, L = 1.5;
    const db = (P * L ** 3) / (3 * E * I), ds = (P * L) / (G * As);
    const r = shearShare({ case: "cantilever-tip-load", L, depth: h, E, I, G, shearArea: As });
    expect(r.share).toBeCloseTo(ds / (db + ds), 12);
  });

  it("falls as the span grows (r ∝ 1/L²)", () => {
    const at = (L: number) => shearShare({ case: "fixed-udl", L, depth: h, E, I, G, shearArea: As }).shearToBending;
    expect(at(6) / at(3)).toBeCloseTo(0.25, 12);
  });

  it("the two-solve share is (uT − uEB)/uT", () => {
    expect(shearShareFromSolves(-0.011, -0.01)).toBeCloseTo(1 / 11, 12);
    expect(shearShareFromSolves(0, 0)).toBe(0);
  });
});

describe("span-to-depth hint (common practice: shear matters below L/d ≈ 10)", () => {
  it.each([
    [3, 0.6, true],
    [5.9, 0.6, true],
    [6, 0.6, false],
    [12, 0.6, false],
  ])("L = %s m, d = %s m → shear matters: %s", (L, d, expected) => {
    expect(spanDepthHint(L, d).shearMatters).toBe(expected);
  });
});
