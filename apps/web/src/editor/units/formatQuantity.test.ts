import { describe, expect, it } from "vitest";
import { cleanNumber, formatEditable, formatFeetInches, formatQuantity } from "./formatQuantity";
import { fromDisplay, toDisplay } from "./unitSystems";

describe("display conversion", () => {
  it.each([
    ["position", 6.5, "si", 6.5],
    ["position", 0.3048, "us", 1],
    ["deflection", 0.0254, "us", 1],
    ["force", 4448.2216152605, "us", 1],
    ["distributed", 4448.2216152605 / 0.3048, "us", 1],
    ["moment", 4448.2216152605 * 0.3048, "us", 1],
    ["modulus", 4448.2216152605 / 0.0254 ** 2, "us", 1],
    ["secondMoment", 0.0254 ** 4, "us", 1],
    ["secondMoment", 8e-5, "si", 8e7],
    ["modulus", 2e11, "si", 2e5],
  ] as const)("%s: %d SI shows as %d in %s", (kind, si, system, shown) => {
    // Relative error: the values span twenty orders of magnitude.
    expect(Math.abs(toDisplay(si, system, kind) / shown - 1)).toBeLessThan(1e-12);
    expect(Math.abs(fromDisplay(shown, system, kind) / si - 1)).toBeLessThan(1e-12);
  });

  it("formats editable values without binary noise", () => {
    expect(cleanNumber(0.1 + 0.2)).toBe(0.3);
    expect(formatEditable(-3000, "si", "distributed")).toBe("-3");
    expect(formatEditable(12 * 0.3048, "us", "position")).toBe("12");
  });

  it("labels values with their display unit", () => {
    expect(formatQuantity(-12000, "si", "force")).toBe("-12 kN");
    expect(formatQuantity(40000, "si", "moment")).toBe("40 kN·m");
    expect(formatQuantity(4448.2216152605 * 0.3048 * 25, "us", "moment")).toBe("25 kip·ft");
  });

  it.each([
    [12 * 0.3048 + 6 * 0.0254, `12'-6"`],
    [12 * 0.3048 + 6.25 * 0.0254, `12'-6 1/4"`],
    [-0.3048, `-1'-0"`],
  ])("writes %d m as %s", (m, text) => {
    expect(formatFeetInches(m)).toBe(text);
  });
});
