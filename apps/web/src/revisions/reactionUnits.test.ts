import { describe, expect, it } from "vitest";
import { formatNumber, formatPercent, formatReaction, formatSigned, toDisplay, unitsFor } from "./reactionUnits";

describe("reaction display units", () => {
  it.each([
    // SI: 1 kN = 1000 N by definition of the prefix.
    ["si", "force", 12_500, "12.500"],
    ["si", "moment", -15_000, "-15.000"],
    // 1 kip = 1000 lbf = 4448.2216152605 N exactly (NIST SP 811, appendix B).
    ["us", "force", 4448.2216152605, "1.000"],
    ["us", "force", 44_482.216152605, "10.000"],
    // 1 kip·ft = 4448.2216152605 N × 0.3048 m = 1355.8179483314004 N·m (NIST SP 811, appendix B).
    ["us", "moment", 1355.8179483314004, "1.000"],
    ["us", "moment", -13_558.179483314004, "-10.000"],
  ] as const)("%s %s: %d SI reads %s", (system, kind, si, expected) => {
    expect(formatReaction(unitsFor(system), kind, si)).toBe(expected);
  });

  it("uses the exact US factors, not rounded ones", () => {
    const us = unitsFor("us");
    expect(us.force.toSI).toBe(4448.2216152605);
    expect(us.length.toSI).toBe(0.3048);
    // 100 kip with a rounded 4.448 kN/kip would read 100.005; the exact factor gives 100.
    expect(toDisplay(us, "force", 444_822.16152605)).toBeCloseTo(100, 10);
  });

  it("labels follow the project", () => {
    expect([unitsFor("si").force.label, unitsFor("si").moment.label]).toEqual(["kN", "kN·m"]);
    expect([unitsFor("us").force.label, unitsFor("us").moment.label]).toEqual(["kip", "kip·ft"]);
  });

  it.each([
    [-0.0004, "0.000"],
    [-0, "0.000"],
    [0.0005, "0.001"],
    [Number.NaN, "—"],
  ])("formats %d as %s (a rounding residue never reads negative)", (value, expected) => {
    expect(formatNumber(value)).toBe(expected);
  });

  it.each([
    [12.54, "+12.5 %"],
    [-3, "-3.0 %"],
    [0.01, "0.0 %"],
  ])("percent %d reads %s", (pct, expected) => {
    expect(formatPercent(pct)).toBe(expected);
  });

  it("signs a positive change and leaves zero unsigned", () => {
    expect([formatSigned(1.25), formatSigned(-0.4), formatSigned(0)]).toEqual(["+1.250", "-0.400", "0.000"]);
  });
});
