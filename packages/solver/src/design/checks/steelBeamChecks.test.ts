import { describe, expect, it } from "vitest";
import { FOOT, INCH, KIP, KIP_FOOT, KSI } from "../usUnits.js";
import { DEFLECTION_LIMIT_PRESETS } from "./deflectionCheck.js";
import { governingRow, steelBeamChecks, type StationLike } from "./steelBeamChecks.js";

/**
 * AISC Design Examples, Example F.1-1 (from memory): W18x50, Fy = 50 ksi, 35 ft simple span,
 * wD = 0.45 kip/ft, wL = 0.75 kip/ft; LRFD wu = 1.2 × 0.45 + 1.6 × 0.75 = 1.74 kip/ft,
 * Mu = 1.74 × 35²/8 = 266 kip-ft, Vu = 1.74 × 35/2 = 30.5 kips. Stations are the exact
 * simple-span diagrams, written as the engine's exchange format would report them.
 */
const L = 35 * FOOT;
const E = 29_000 * KSI;
const Ix = 800 * INCH ** 4;
function stations(w: number): StationLike[] {
  return Array.from({ length: 121 }, (_, i) => {
    const x = (i * L) / 120;
    return {
      x,
      V: w * (L / 2 - x),
      M: (w * x * (L - x)) / 2,
      uy: (-w * x * (L ** 3 - 2 * L * x * x + x ** 3)) / (24 * E * Ix),
    };
  });
}
const wu = 1.74 * KIP / FOOT;
const wL = 0.75 * KIP / FOOT;
const shape = { kind: "i-shape" as const, d: 18.0 * INCH, bf: 7.5 * INCH, tw: 0.355 * INCH, tf: 0.57 * INCH };
const properties = { Zx: 101 * INCH ** 3, Sx: 88.9 * INCH ** 3, ry: 1.65 * INCH, rts: 1.98 * INCH, J: 1.24 * INCH ** 4, ho: 17.4 * INCH };
const floorLive = { kind: "preset" as const, preset: DEFLECTION_LIMIT_PRESETS.find((p) => p.id === "floor-live")! };

function table(bracePoints: number[]) {
  return steelBeamChecks({
    shape, properties, Fy: 50 * KSI, E, method: "LRFD", bracePoints,
    spans: [{ label: "1", x1: 0, x2: L, kind: "span" }],
    strength: [{ id: "LRFD2", stations: stations(wu) }],
    deflection: [{ id: "L", stations: stations(wL), limit: floorLive }],
  });
}

describe("steel beam check table", () => {
  it("braced at third points: middle segment Cb = 12.5/12.33 = 1.014 (the example rounds to 1.01) and φMn ≈ 306 kip-ft (Example F.1-1B)", () => {
    const rows = table([L / 3, (2 * L) / 3]).filter((r) => r.check.id === "aisc360-22-f2");
    expect(rows).toHaveLength(3);
    const middle = rows[1]!.check;
    expect(middle.status).toBe("pass");
    if (middle.status === "not-covered") return;
    expect(middle.demand / KIP_FOOT).toBeCloseTo(266.4, 0);
    // Hand calculation as in aiscF2.test.ts with Cb = 1.0135: 1.0135 × 336.0 × 0.9 = 306.5 kip-ft.
    expect(middle.capacity / KIP_FOOT).toBeCloseTo(306.5, 0);
  });

  it("braced at the ends only: Cb = 1.14 and the section fails LTB (Example F.1-1C)", () => {
    const f2 = table([]).find((r) => r.check.id === "aisc360-22-f2")!;
    expect(f2.check.status).toBe("fail");
    expect(governingRow(table([]))?.check.id).toBe("aisc360-22-f2");
  });

  it("shear: Vu = 30.5 kips against φvVn = 192 kips", () => {
    const g2 = table([]).find((r) => r.check.id === "aisc360-22-g2")!.check;
    expect(g2.status !== "not-covered" && g2.demand / KIP).toBeCloseTo(30.45, 1);
    expect(g2.status !== "not-covered" && g2.capacity / KIP).toBeCloseTo(191.7, 1);
  });

  it("live-load deflection 5wL⁴/(384EI) = 1.09 in against L/360 = 1.17 in: passes at 0.935", () => {
    // w = 0.75/12 = 0.0625 kip/in; 5 × 0.0625 × 420⁴ = 9.724e9; 384 × 29 000 × 800 = 8.909e9 → δ = 1.091 in;
    // L/360 = 420/360 = 1.167 in → utilisation 0.935.
    const d = table([]).find((r) => r.check.id === "deflection")!.check;
    expect(d.status !== "not-covered" && d.demand / INCH).toBeCloseTo(1.091, 2);
    expect(d.status !== "not-covered" && d.utilisation).toBeCloseTo(0.935, 2);
  });
});
