import { describe, expect, it } from "vitest";
import { INCH, KIP, KSI } from "../usUnits.js";
import { checkAiscG2Shear, g2ShearStrength } from "./aiscG2.js";

const E = 29_000 * KSI;
const Fy = 50 * KSI;

describe("AISC 360-22 §G2.1 shear of I-shape webs", () => {
  it("W18x50 (h/tw = 45.2 ≤ 2.24√(E/Fy) = 53.9): φvVn = 1.00 × 0.6 × 50 × 18.0 × 0.355 = 192 kips, Vn/Ωv = 128 kips (AISC Manual Table 3-2, from memory)", () => {
    const args = { d: 18.0 * INCH, tw: 0.355 * INCH, h: 45.2 * 0.355 * INCH, Fy, E, fabrication: "rolled" as const };
    const lrfd = checkAiscG2Shear({ ...args, method: "LRFD", Vr: 100 * KIP });
    const asd = checkAiscG2Shear({ ...args, method: "ASD", Vr: 100 * KIP });
    expect(lrfd.capacity / KIP).toBeCloseTo(191.7, 1);
    expect(asd.capacity / KIP).toBeCloseTo(127.8, 1);
    expect(lrfd.source).toContain("G2.1(a)");
    expect(lrfd.utilisation).toBeCloseTo(100 / 191.7, 3);
  });

  it("W24x55 (h/tw = 54.6 > 53.9): (b) applies with φv = 0.90 and Cv1 = 1.0: φvVn = 0.9 × 0.6 × 50 × 23.6 × 0.395 = 252 kips (Manual Table 3-2, from memory)", () => {
    const s = g2ShearStrength(23.6 * INCH, 0.395 * INCH, 54.6 * 0.395 * INCH, Fy, E, "rolled");
    expect(s.phi).toBe(0.9);
    expect(s.Cv1).toBe(1);
    expect((s.phi * s.Vn) / KIP).toBeCloseTo(251.7, 1);
  });

  it("the recalled h/tw of W18x50 and W24x55 follow from h = d − 2·k_des (Table 1-1 dimensions, from memory)", () => {
    // W18x50: d = 18.0 in, tw = 0.355 in, k_des = 0.972 in; W24x55: d = 23.6 in, tw = 0.395 in, k_des = 1.01 in.
    // For rolled shapes the tables take h as the clear distance between the fillets (AISC 360-22 §B4.1b).
    expect((18.0 - 2 * 0.972) / 0.355).toBeCloseTo(45.2, 1);
    expect((23.6 - 2 * 1.01) / 0.395).toBeCloseTo(54.6, 1);
    // and the limits quoted: 2.24√(E/Fy) = 53.9, 1.10√(kv·E/Fy) with kv = 5.34 = 61.2 (Fy = 50 ksi)
    expect(2.24 * Math.sqrt(29_000 / 50)).toBeCloseTo(53.9, 1);
    expect(1.1 * Math.sqrt((5.34 * 29_000) / 50)).toBeCloseTo(61.2, 1);
  });

  it("slender built-up web, hand calculation: h/tw = 120 > 1.10√(5.34·E/Fy) = 61.2 → Cv1 = 0.510 (eq. G2-4)", () => {
    // d = 1000 mm, tw = 8 mm, h = 960 mm, Fy = 345 MPa, E = 200 GPa:
    // 1.10 × √(5.34 × 200000/345) = 1.10 × 55.64 = 61.20; Cv1 = 61.20/120 = 0.5100;
    // Vn = 0.6 × 345 × 8000 mm² × 0.5100 = 844.6 kN; φvVn = 0.90 × 844.6 = 760.1 kN.
    const s = g2ShearStrength(1.0, 0.008, 0.96, 345e6, 200e9, "built-up");
    expect(s.Cv1).toBeCloseTo(0.51, 3);
    expect(s.Vn / 1e3).toBeCloseTo(844.6, 0);
    const r = checkAiscG2Shear({ d: 1.0, tw: 0.008, h: 0.96, Fy: 345e6, Vr: 800e3, method: "LRFD", fabrication: "built-up" });
    expect(r.status).toBe("fail");
    expect(r.capacity / 1e3).toBeCloseTo(760.1, 0);
  });
});
