import { describe, expect, it } from "vitest";
import type { Material } from "../materials/material.js";
import { assembleBeamChecks, checkStationsForSpans, type BeamCheckInput } from "./beamChecks.js";
import { DEFLECTION_LIMIT_PRESETS } from "./deflectionCheck.js";
import { bracePointsEvery } from "./resultStations.js";
import type { SpanRef, StationLike } from "./steelBeamChecks.js";

/**
 * Invented demo beam: one 6 m simple span, uniform load w. Stations are the closed-form simple-span
 * diagrams (statics; deflection from the elastic curve w·x·(L³ − 2Lx² + x³)/(24EI)), as the engine
 * reports them: V and M positive sagging, uy positive up.
 */
const L = 6;
const EI = 200e9 * 1e-4;
function simpleSpan(w: number, n = 48): StationLike[] {
  return Array.from({ length: n + 1 }, (_, i) => {
    const x = (i * L) / n;
    return { x, V: w * (L / 2 - x), M: (w * x * (L - x)) / 2, uy: (-w * x * (L ** 3 - 2 * L * x * x + x ** 3)) / (24 * EI) };
  });
}
const spans: SpanRef[] = [{ label: "1", x1: 0, x2: L, kind: "span" }];
const steel: Material = { id: "s", name: "Steel (demo)", kind: "steel", E: 200e9, Fy: 345e6, typical: true, note: "", source: "demo" };
const noFy: Material = { ...steel, id: "t", name: "Timber (demo)", kind: "timber", E: 11e9, Fy: undefined };
const floorLive = { kind: "preset" as const, preset: DEFLECTION_LIMIT_PRESETS.find((p) => p.id === "floor-live")! };
const iShape = { kind: "i-shape" as const, d: 0.3, bf: 0.15, tf: 0.01, tw: 0.006 };
const rectangle = { kind: "rectangle" as const, b: 0.2, h: 0.4 };

function input(over: Partial<BeamCheckInput>): BeamCheckInput {
  return {
    shape: iShape, material: steel, method: "LRFD", spans, bracePoints: [],
    strength: [{ id: "C1", stations: simpleSpan(36e3) }],
    deflection: [{ id: "L", stations: simpleSpan(15e3), limit: floorLive }],
    allowableBending: 200e6, allowableShear: 100e6,
    ...over,
  };
}

describe("assembleBeamChecks", () => {
  it("checks an I-shape with Fy by AISC F2 and G2, then deflection, per span", () => {
    const { basis, rows } = assembleBeamChecks(input({}));
    expect(basis).toBe("aisc-360-22");
    expect(rows.map((r) => r.check.id)).toEqual(["aisc360-22-f2", "aisc360-22-g2", "deflection"]);
    // Mu = wL²/8 = 36·36/8 = 162 kN·m; Vu = wL/2 = 108 kN (statics)
    const [f2, g2] = rows.map((r) => r.check);
    expect(f2!.status === "not-covered" ? NaN : f2!.demand).toBeCloseTo(162e3, 0);
    expect(g2!.status === "not-covered" ? NaN : g2!.demand).toBeCloseTo(108e3, 0);
  });

  it("takes Cb = 1.0 when asked, never above the capacity with Cb from eq. F1-1 (Cb ≥ 1)", () => {
    const capacity = (cb: "equation-f1-1" | "unity") => {
      const f2 = assembleBeamChecks(input({ cb })).rows[0]!.check;
      return { value: f2.status === "not-covered" ? NaN : f2.capacity, cb: f2.inputs.find((i) => i.symbol === "Cb") };
    };
    const unity = capacity("unity");
    const f11 = capacity("equation-f1-1");
    expect(unity.cb?.value).toBe(1);
    expect(unity.cb?.description).toContain("taken as 1.0");
    // uniform load between end braces: Cb = 12.5/(2.5 + 3·0.75 + 4 + 3·0.75) = 1.136 (eq. F1-1)
    expect(f11.cb?.value).toBeCloseTo(12.5 / 11, 3);
    expect(unity.value).toBeLessThan(f11.value);
  });

  it("checks an I-shape without Fy, and any other shape, elastically against the allowables", () => {
    expect(assembleBeamChecks(input({ material: noFy })).basis).toBe("elastic");
    const { basis, rows } = assembleBeamChecks(input({ shape: rectangle }));
    expect(basis).toBe("elastic");
    expect(rows.map((r) => r.check.id)).toEqual(["elastic-bending-stress", "elastic-shear-stress", "deflection"]);
    // σ = M·c/I = 162e3·0.2/(0.2·0.4³/12) = 30.4 MPa; τ = 1.5·V/A = 1.5·108e3/0.08 = 2.03 MPa (rectangle, closed form)
    const [bending, shear] = rows.map((r) => r.check);
    expect(bending!.status === "not-covered" ? NaN : bending!.demand).toBeCloseTo((162e3 * 0.2) / ((0.2 * 0.4 ** 3) / 12), -2);
    expect(shear!.status === "not-covered" ? NaN : shear!.demand).toBeCloseTo((1.5 * 108e3) / 0.08, -1);
  });

  it("leaves out an elastic check whose allowable is null", () => {
    const rows = assembleBeamChecks(input({ shape: rectangle, allowableBending: null, allowableShear: null })).rows;
    expect(rows.map((r) => r.check.id)).toEqual(["deflection"]);
  });

  it("keeps the sign of the peak moment, so a hogging peak stresses the top fibre in tension", () => {
    const hogging = simpleSpan(-36e3);
    const rows = assembleBeamChecks(input({ shape: rectangle, strength: [{ id: "C1", stations: hogging }] })).rows;
    const M = rows[0]!.check.inputs.find((i) => i.symbol === "M")!.value;
    // wL²/8 = 36 kN/m × (6 m)² / 8 (simple span, uniform load: AISC Manual Table 3-23, case 1)
    expect(M).toBeCloseTo(-162e3, 0);
    expect(rows[0]!.check.inputs.find((i) => i.symbol === "σtop")!.value).toBeGreaterThan(0);
  });

  it("asks for stations at span ends, brace points and quarter points", () => {
    const xs = checkStationsForSpans(spans, 2);
    expect(bracePointsEvery(spans, 2)).toEqual([2, 4]);
    for (const x of [0, 0.5, 1, 1.5, 2, 4, 6]) expect(xs).toContain(x);
  });
});
