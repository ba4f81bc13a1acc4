import { describe, expect, it } from "vitest";
import { displayUnit, formatNumber, formatQuantity, fromDisplay, inputUnitFactor, inputUnitKind, toDisplay, type Quantity } from "./units.js";

// Exact factors: 1 lbf = 4.4482216152605 N, 1 ft = 0.3048 m, 1 in = 0.0254 m (NIST SP 811, B.8).
describe("display units", () => {
  it.each<[Quantity, string, number, number]>([
    ["force", "kip", 4448.2216152605, 1],
    ["moment", "kip·ft", 4448.2216152605 * 0.3048, 1],
    ["length", "ft", 0.3048, 1],
    ["distributed", "kip/ft", 4448.2216152605 / 0.3048, 1],
    ["deflection", "in", 0.0254, 1],
    // 1 ksi = 6.894757 MPa (NIST SP 811 B.8).
    ["modulus", "ksi", 6.894757293168361e6, 1],
  ])("US %s in %s", (quantity, label, si, display) => {
    expect(displayUnit("us", quantity).label).toBe(label);
    expect(toDisplay("us", quantity, si)).toBeCloseTo(display, 12);
    expect(fromDisplay("us", quantity, display)).toBeCloseTo(si, 6);
  });

  it.each<[Quantity, string, number, number]>([
    ["force", "kN", 12000, 12],
    ["moment", "kN·m", 15000, 15],
    ["distributed", "kN/m", -3000, -3],
    ["deflection", "mm", 0.0125, 12.5],
    ["inertia", "10⁶ mm⁴", 8.0e-5, 80],
  ])("SI %s in %s", (quantity, label, si, display) => {
    expect(displayUnit("si", quantity).label).toBe(label);
    expect(toDisplay("si", quantity, si)).toBeCloseTo(display, 12);
  });

  it("never prints a negative zero", () => {
    expect(formatNumber(-0.0001, 3)).toBe("0.000");
    expect(formatNumber(-0.0006, 3)).toBe("-0.001");
    expect(formatQuantity("si", "force", -12000)).toBe("-12.000 kN");
  });
});

describe("typed input units", () => {
  it.each<[string, number]>([
    ["kN", 1000],
    ["kip", 4448.2216152605],
    ["kN·m", 1000],
    ["kN*m", 1000],
    ["kNm", 1000],
    ["kip-ft", 4448.2216152605 * 0.3048],
    ["kN/m", 1000],
    ["kip/ft", 4448.2216152605 / 0.3048],
    ["mm", 0.001],
    ["in", 0.0254],
  ])("reads %s", (unit, factor) => {
    const kind = inputUnitKind(unit);
    expect(kind).toBeDefined();
    expect(inputUnitFactor(kind!, unit)).toBeCloseTo(factor, 9);
  });

  it("knows no tonnes or yards", () => {
    expect(inputUnitKind("t")).toBeUndefined();
    expect(inputUnitKind("yd")).toBeUndefined();
  });
});
