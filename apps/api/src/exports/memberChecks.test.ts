import { describe, expect, it } from "vitest";
import type { BeamModel } from "@spanwright/handoff";
import type { Material } from "@spanwright/solver/design";
import { SERVICE_COMBINATION_ID, memberChecks } from "./memberChecks.js";

/** Invented demo beam: two 5 m spans, dead 10 kN/m and live 5 kN/m, combination 1.2D + 1.6L. */
const model: BeamModel = {
  format: "spanwright.beam/1",
  nodes: [{ x: 0, support: { type: "pinned" } }, { x: 5, support: { type: "pinned" } }, { x: 10, support: { type: "pinned" } }],
  segments: [{ E: 2e11, I: 1.0667e-3 }, { E: 2e11, I: 1.0667e-3 }],
  loadCases: [
    { id: "D", category: "dead", loads: [{ type: "distributed", x1: 0, x2: 10, qy1: -10_000, qy2: -10_000 }] },
    { id: "L", category: "live", loads: [{ type: "distributed", x1: 0, x2: 10, qy1: -5_000, qy2: -5_000 }] },
  ],
  combinations: [{ id: "C1", factors: { D: 1.2, L: 1.6 } }],
};
const steel: Material = { id: "s", name: "Steel (demo)", kind: "steel", E: 200e9, Fy: 345e6, typical: true, note: "", source: "demo" };

// wu = 1.2·10 + 1.6·5 = 20 kN/m; two equal spans: M_B = wL²/8 = 62.5 kN·m, V_max = 5wL/8 = 62.5 kN
// (continuous-beam coefficients, AISC Manual Table 3-23 case 29, from memory)
const MB = 62_500;
const VMAX = 62_500;

describe("memberChecks", () => {
  it("checks an I-shape by AISC F2 and G2 per span for each combination, and deflection for live and service D+L", () => {
    const { rows, basis } = memberChecks(model, { name: "I-300", shape: { kind: "i-shape", d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 }, material: steel }, "LRFD");
    expect(rows.map((r) => `${r.span} ${r.caseId} ${r.check.id}`)).toEqual([
      expect.stringMatching(/^1 C1 aisc360-22-f2/), expect.stringMatching(/^1 C1 aisc360-22-g2/), "1 L deflection", `1 ${SERVICE_COMBINATION_ID} deflection`,
      expect.stringMatching(/^2 C1 aisc360-22-f2/), expect.stringMatching(/^2 C1 aisc360-22-g2/), "2 L deflection", `2 ${SERVICE_COMBINATION_ID} deflection`,
    ]);
    const f2 = rows[0]!.check;
    expect(f2.status === "not-covered" ? NaN : f2.demand).toBeCloseTo(MB, 0);
    const g2 = rows[1]!.check;
    expect(g2.status === "not-covered" ? NaN : g2.demand).toBeCloseTo(VMAX, 0);
    // live deflection limit L/360 = 5/360 m (IBC 2021 Table 1604.3, from memory); total L/240
    const [live, total] = [rows[2]!.check, rows[3]!.check];
    expect(live.status === "not-covered" ? NaN : live.capacity).toBeCloseTo(5 / 360, 12);
    expect(total.status === "not-covered" ? NaN : total.capacity).toBeCloseTo(5 / 240, 12);
    expect(basis).toContain("AISC 360-22 LRFD");
    expect(basis).toContain("Fy = 345 MPa");
  });

  it("checks any other shape elastically against 0.6·Fy and 0.4·Fy", () => {
    const { rows, basis } = memberChecks(model, { name: "R 200x400", shape: { kind: "rectangle", b: 0.2, h: 0.4 }, material: steel }, "LRFD");
    const bending = rows.find((r) => r.span === "1" && r.check.id === "elastic-bending-stress")!.check;
    const shear = rows.find((r) => r.span === "1" && r.check.id === "elastic-shear-stress")!.check;
    // σ = M·c/I = 62.5e3 · 0.2 / (0.2·0.4³/12) = 11.72 MPa; τ = 1.5·V/A = 1.5·62.5e3/0.08 = 1.172 MPa (rectangle, closed form)
    expect(bending.status === "not-covered" ? NaN : bending.demand).toBeCloseTo((MB * 0.2) / ((0.2 * 0.4 ** 3) / 12), -2);
    expect(bending.status === "not-covered" ? NaN : bending.capacity).toBeCloseTo(0.6 * 345e6, 0);
    expect(shear.status === "not-covered" ? NaN : shear.demand).toBeCloseTo((1.5 * VMAX) / 0.08, -1);
    expect(shear.status === "not-covered" ? NaN : shear.capacity).toBeCloseTo(0.4 * 345e6, 0);
    expect(basis).toContain("0.6·Fy");
  });

  it("checks only deflections when the material gives no Fy", () => {
    const timber: Material = { id: "t", name: "Glulam (demo)", kind: "timber", E: 11e9, typical: true, note: "", source: "demo" };
    const { rows, basis } = memberChecks(model, { name: "GL", shape: { kind: "rectangle", b: 0.2, h: 0.4 }, material: timber }, "LRFD");
    expect(new Set(rows.map((r) => r.check.id))).toEqual(new Set(["deflection"]));
    expect(basis).toContain("only deflections");
  });
});
