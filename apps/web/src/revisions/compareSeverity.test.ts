import { describe, expect, it } from "vitest";
import type { ValueChangeJson } from "@spanwright/contracts";
import { changeSeverity, compareRowsToTsv, isHighlighted, toCompareRows } from "./compareSeverity";
import { unitsFor } from "./reactionUnits";

const value = (before: number | null, after: number | null, flagged = false): ValueChangeJson => {
  const change = before !== null && after !== null ? after - before : null;
  const changePct = change !== null && before !== null && before !== 0 ? (100 * change) / Math.abs(before) : null;
  return { x: 6, label: "S2", kind: "case", id: "D", quantity: "fy", before, after, change, changePct, flagged };
};

describe("compare highlighting", () => {
  it.each([
    // threshold 5 %: 100 -> 104 is 4 %, 100 -> 105 exactly 5 % (not beyond), 100 -> 106 is 6 %
    [value(100_000, 104_000), 5, "within", false],
    [value(100_000, 105_000), 5, "within", false],
    [value(100_000, 106_000), 5, "beyond", true],
    [value(100_000, 94_000), 5, "beyond", true],
    [value(100_000, 100_000), 5, "same", false],
    // a stricter project threshold flags what the default would not
    [value(100_000, 102_000), 1, "beyond", true],
    [value(100_000, 102_000), 10, "within", false],
    // appeared or vanished always highlights
    [value(null, 5_000, true), 5, "added", true],
    [value(5_000, null, true), 5, "removed", true],
    // from zero: no percent, the API's flag decides
    [value(0, 3_000, true), 5, "beyond", true],
    [value(0, 0, false), 5, "same", false],
  ] as const)("%o at %d %% is %s", (v, threshold, severity, highlighted) => {
    const s = changeSeverity(v, threshold);
    expect(s).toBe(severity);
    expect(isHighlighted(s)).toBe(highlighted);
  });

  it("writes compare rows as tab-separated text with both revisions and the change", () => {
    const rows = toCompareRows([value(100_000, 110_000)], 5);
    const lines = compareRowsToTsv(rows, unitsFor("si"), 3, 4).split("\n");
    expect(lines[0]).toBe("Support\tx (m)\tResult\tUnit\tr3\tr4\tChange\tChange %\tFlag");
    expect(lines[1]).toBe("S2\t6\tD Fy\tkN\t100.000\t110.000\t+10.000\t+10.0 %\tbeyond threshold");
  });
});
