import { describe, expect, it } from "vitest";
import { checkDeflection, DEFLECTION_LIMIT_PRESETS, spanDeflection } from "./deflectionCheck.js";

const E = 200e9, I = 8e-5;
const preset = (id: string) => {
  const p = DEFLECTION_LIMIT_PRESETS.find((x) => x.id === id);
  if (!p) throw new Error(id);
  return { kind: "preset" as const, preset: p };
};

describe("deflection checks on handbook cases", () => {
  it("simple span, UDL: δ = 5wL⁴/(384EI) = 10.55 mm against L/360 = 16.67 mm (IBC 2021 Table 1604.3 floor, live)", () => {
    // w = 10 kN/m, L = 6 m: 5 × 10 000 × 6⁴/(384 × 2e11 × 8e-5) = 0.010547 m (AISC Manual Table 3-23 case 1; Roark).
    const w = 10e3, L = 6;
    const delta = (5 * w * L ** 4) / (384 * E * I);
    const r = checkDeflection({ length: L, spanKind: "span", deflection: -delta, limit: preset("floor-live") });
    expect(r.capacity).toBeCloseTo(L / 360, 12);
    expect(r.demand).toBeCloseTo(0.010547, 6);
    expect(r.utilisation).toBeCloseTo(0.6328, 4);
    expect(r.pass).toBe(true);
    expect(r.source).toContain("IBC 2021 Table 1604.3");
  });

  it("the same beam fails a user-typed L/600", () => {
    const delta = (5 * 10e3 * 6 ** 4) / (384 * E * I);
    const r = checkDeflection({ length: 6, spanKind: "span", deflection: delta, limit: { kind: "ratio", ratio: 600 } });
    expect(r.status).toBe("fail");
    expect(r.utilisation).toBeCloseTo(0.010547 / 0.01, 3);
  });

  it("cantilever, tip load: δ = PL³/(3EI) = 1.667 mm against 2·Lc/360 = 11.1 mm (common practice)", () => {
    const P = 10e3, Lc = 2;
    const r = checkDeflection({ length: Lc, spanKind: "cantilever", deflection: (P * Lc ** 3) / (3 * E * I), limit: preset("floor-live") });
    expect(r.capacity).toBeCloseTo((2 * Lc) / 360, 12);
    expect(r.utilisation).toBeCloseTo(0.0016667 / 0.011111, 4);
    expect(r.formula).toBe("δ ≤ 2·Lc/360");
  });

  it("an absolute limit typed by the user is used as is", () => {
    const r = checkDeflection({ length: 6, spanKind: "span", deflection: 0.021, limit: { kind: "absolute", value: 0.02 } });
    expect(r.capacity).toBe(0.02);
    expect(r.pass).toBe(false);
  });

  it("IBC presets: floor L/360 live and L/240 total; roof without ceiling L/180 and L/120", () => {
    const ratio = (id: string) => preset(id).preset.ratio;
    expect([ratio("floor-live"), ratio("floor-total"), ratio("roof-no-ceiling-live"), ratio("roof-no-ceiling-total")]).toEqual([360, 240, 180, 120]);
  });
});

describe("span deflection from samples", () => {
  const L = 6, w = 10e3;
  const bending = (x: number) => (-w * x * (L ** 3 - 2 * L * x * x + x ** 3)) / (24 * E * I);

  it("measures from the chord, so a settled support does not count as deflection", () => {
    const settle = -0.005;
    const samples = Array.from({ length: 61 }, (_, i) => {
      const x = (i * L) / 60;
      return { x, uy: bending(x) + (settle * x) / L };
    });
    expect(spanDeflection(samples, 0, L)).toBeCloseTo((-5 * w * L ** 4) / (384 * E * I), 9);
  });

  it("measures a cantilever from its support displacement", () => {
    const samples = [{ x: 6, uy: -0.002 }, { x: 7, uy: -0.004 }, { x: 8, uy: -0.007 }];
    expect(spanDeflection(samples, 6, 8, "left")).toBeCloseTo(-0.005, 12);
  });
});
