import { describe, expect, it } from "vitest";
import type { BeamModel } from "@spanwright/handoff";
import { checkStations, stationsFromResult, steelBeamChecks, type Material } from "@spanwright/solver/design";
import { solve } from "@spanwright/solver";
import { bracePointsEvery } from "@spanwright/solver/design";
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
    const { rows, basis } = memberChecks(model, { name: "I-300", shape: { kind: "i-shape", d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 }, material: steel }, { method: "LRFD" });
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
    const { rows, basis } = memberChecks(model, { name: "R 200x400", shape: { kind: "rectangle", b: 0.2, h: 0.4 }, material: steel }, { method: "LRFD" });
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
    const { rows, basis } = memberChecks(model, { name: "GL", shape: { kind: "rectangle", b: 0.2, h: 0.4 }, material: timber }, { method: "LRFD" });
    expect(new Set(rows.map((r) => r.check.id))).toEqual(new Set(["deflection"]));
    expect(basis).toContain("only deflections");
  });

  it("uses the deflection limits and cases chosen, and names chosen ids the revision lacks", () => {
    const limit = { kind: "ratio" as const, ratio: 300 };
    const { rows, basis } = memberChecks(model, { name: "I-300", shape: { kind: "i-shape", d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 }, material: steel }, {
      method: "LRFD", strengthIds: ["C1", "C9"], deflection: [{ limit, ids: ["L", "gone"] }],
    });
    const deflections = rows.filter((r) => r.check.id === "deflection");
    expect(deflections.map((r) => `${r.span} ${r.caseId}`)).toEqual(["1 L", "2 L"]);
    // L/300 of a 5 m span = 16.7 mm (typed ratio)
    expect(deflections.map((r) => (r.check.status === "not-covered" ? NaN : r.check.capacity))).toEqual([5 / 300, 5 / 300]);
    expect(basis).toContain("deflection L/300 for L");
    expect(basis).toContain("not in this revision, so not checked: C9, gone");
  });

  describe("with an unbraced length Lb", () => {
    const iShape = { kind: "i-shape" as const, d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 };
    // The same loads over two 10 m spans, where lateral-torsional buckling governs without braces.
    const long: BeamModel = { ...model, nodes: [0, 10, 20].map((x) => ({ x, support: { type: "pinned" as const } })) };
    const f2Capacities = (m: BeamModel, Lb: number | null) =>
      memberChecks(m, { name: "I-300", shape: iShape, material: steel }, { method: "LRFD", Lb }).rows.filter((r) => r.check.id.startsWith("aisc360-22-f2")).map((r) => (r.check.status === "not-covered" ? NaN : r.check.capacity));
    const capacityOfF2 = (Lb: number | null) => f2Capacities(model, Lb)[0]!;
    // Hand check (AISC 360-22 F2, compact flanges bf/2tf = 7.5 < 0.38·√(E/Fy) = 9.15 and web
    // h/tw = 46.7 < 3.76·√(E/Fy) = 90.5, Table B4.1b): Zx = bf·tf·(d − tf) + tw·(d − 2tf)²/4
    // = 0.15·0.01·0.29 + 0.006·0.28²/4 = 5.526e-4 m³; Iy = 2·tf·bf³/12 + (d − 2tf)·tw³/12 = 5.630e-6 m⁴,
    // A = 4.68e-3 m², ry = 34.68 mm; Lp = 1.76·ry·√(E/Fy) = 1.470 m (F2-5).
    // Lb = 1 m < Lp: φMn = 0.9·Fy·Zx = 0.9·345e6·5.526e-4 = 171.6 kN·m (F2-1, φb = 0.90 §F1).
    const PHI_MP = 0.9 * 345e6 * (0.15 * 0.01 * 0.29 + (0.006 * 0.28 ** 2) / 4);

    it("braces every Lb from the start of each span", () => {
      expect(bracePointsEvery([{ label: "1", x1: 0, x2: 5, kind: "span" }, { label: "2", x1: 5, x2: 10, kind: "span" }], 2)).toEqual([2, 4, 7, 9]);
      expect(bracePointsEvery([{ label: "1", x1: 0, x2: 5, kind: "span" }], null)).toEqual([]);
    });

    it("reaches the plastic moment when Lb < Lp, above the capacity braced at the supports only", () => {
      for (const c of f2Capacities(long, 1)) expect(c).toBeCloseTo(PHI_MP, -2);
      // Lb = 10 m, far beyond Lr (F2-6: rts = 39.8 mm, J = 1.20e-7 m⁴, ho = 0.29 m give Lr ≈ 4.1 m): elastic lateral-torsional buckling (F2-4)
      // even with Cb from the moment diagram keeps φMn well under half of φMp
      for (const c of f2Capacities(long, null)) expect(c).toBeLessThan(0.5 * PHI_MP);
    });

    it("gives the numbers steelBeamChecks gives for the same braces, as the editor's Checks tab does", () => {
      const Lb = 2.5;
      const spans = [{ label: "1", x1: 0, x2: 5, kind: "span" as const }, { label: "2", x1: 5, x2: 10, kind: "span" as const }];
      const bracePoints = bracePointsEvery(spans, Lb);
      const solved = solve({ ...model, stations: checkStations([0, 5, 10], bracePoints) });
      const direct = steelBeamChecks({ shape: iShape, Fy: 345e6, E: 200e9, method: "LRFD", spans, bracePoints, strength: [{ id: "C1", stations: stationsFromResult(solved, "C1") }], deflection: [] });
      const { rows, basis } = memberChecks(model, { name: "I-300", shape: iShape, material: steel }, { method: "LRFD", Lb });
      const f2 = (r: { check: { id: string } }) => r.check.id.startsWith("aisc360-22-f2");
      expect(rows.filter(f2).map((r) => r.check)).toEqual(direct.filter(f2).map((r) => r.check));
      expect(capacityOfF2(Lb)).not.toBeCloseTo(capacityOfF2(null), -2);
      expect(basis).toContain("every Lb = 2.5 m");
    });
  });
});
