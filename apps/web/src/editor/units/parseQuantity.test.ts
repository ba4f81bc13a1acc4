import { describe, expect, it } from "vitest";
import { parseQuantity } from "./parseQuantity";
import type { QuantityKind, UnitSystemId } from "./unitSystems";

// Exact definitions, NIST SP 811 appendix B: 1 in = 0.0254 m, 1 ft = 0.3048 m,
// 1 lbf = 4.4482216152605 N, 1 kip = 1000 lbf.
const IN = 0.0254;
const FT = 0.3048;
const LBF = 4.4482216152605;
const KIP = 1000 * LBF;

describe("parseQuantity reads what engineers type into SI", () => {
  it.each<[string, QuantityKind, UnitSystemId, number]>([
    ["6.5 m", "position", "si", 6.5],
    ["6500 mm", "position", "si", 6.5],
    ["6.5", "position", "si", 6.5],
    ["650 cm", "position", "si", 6.5],
    ["12 ft 6 in", "position", "us", 12 * FT + 6 * IN],
    ["12'-6\"", "position", "us", 12 * FT + 6 * IN],
    ["12' 6\"", "position", "us", 12 * FT + 6 * IN],
    ["12'-6 1/2\"", "position", "us", 12 * FT + 6.5 * IN],
    ["12'", "position", "us", 12 * FT],
    ["12ft", "position", "us", 12 * FT],
    ["6 in", "position", "us", 6 * IN],
    ["3/4\"", "deflection", "us", 0.75 * IN],
    ["12.5", "position", "us", 12.5 * FT],
    ["2.5 kip/ft", "distributed", "us", (2.5 * KIP) / FT],
    ["-2.5 klf", "distributed", "us", (-2.5 * KIP) / FT],
    ["-3 kN/m", "distributed", "si", -3000],
    ["-3", "distributed", "si", -3000],
    ["-3", "distributed", "us", (-3 * KIP) / FT],
    ["12 kip", "force", "si", 12 * KIP],
    ["500 lbf", "force", "us", 500 * LBF],
    ["-12", "force", "si", -12000],
    ["40 kN·m", "moment", "si", 40000],
    ["40 kNm", "moment", "si", 40000],
    ["40 kip-ft", "moment", "us", 40 * KIP * FT],
    ["200000 MPa", "modulus", "si", 2e11],
    ["200 GPa", "modulus", "si", 2e11],
    ["29000 ksi", "modulus", "us", 29000 * KIP / (IN * IN)],
    ["29000", "modulus", "us", 29000 * KIP / (IN * IN)],
    ["8.0e7 mm4", "secondMoment", "si", 8e-5],
    ["80,000,000 mm⁴", "secondMoment", "si", 8e-5],
    ["192 in^4", "secondMoment", "us", 192 * IN ** 4],
    ["50 kN/mm", "springK", "si", 5e7],
    ["1.2", "factor", "si", 1.2],
    ["−5 mm", "settlement", "si", -0.005],
  ])("%s as %s (%s)", (text, kind, system, expected) => {
    const result = parseQuantity(text, kind, system);
    expect(result.ok).toBe(true);
    if (result.ok) expect(Math.abs(result.value / expected - 1)).toBeLessThan(1e-12);
  });

  it("keeps exact definitions: 1 in is 25.4 mm, 1 ft is 304.8 mm, 1 kip is 4448.2216152605 N", () => {
    const inch = parseQuantity("1 in", "position", "si");
    const foot = parseQuantity("1 ft", "position", "si");
    const kip = parseQuantity("1 kip", "force", "si");
    expect(inch.ok && inch.value * 1000).toBeCloseTo(25.4, 12);
    expect(foot.ok && foot.value).toBe(0.3048);
    expect(kip.ok && kip.value).toBeCloseTo(4448.2216152605, 9);
  });

  it.each<[string, QuantityKind, string]>([
    ["", "position", "empty"],
    ["abc", "position", "not-a-number"],
    ["5 furlongs", "position", "unknown-unit"],
    ["5 kN", "position", "wrong-dimension"],
    ["5 m", "force", "wrong-dimension"],
    ["2 kN/m", "moment", "wrong-dimension"],
    ["2 m", "factor", "wrong-dimension"],
  ])("rejects %j for %s with %s", (text, kind, code) => {
    const result = parseQuantity(text, kind, "si");
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.code).toBe(code);
  });
});
