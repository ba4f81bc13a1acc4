import { describe, expect, it } from "vitest";
import { columnKey, describeColumn, pivotReactions } from "./pivotReactions";
import { sampleReactionTable } from "./testTables";

describe("pivotReactions", () => {
  it("gives one row per support and columns grouped case, combination, envelope", () => {
    const { rows, columns } = pivotReactions(sampleReactionTable());
    expect(rows.map((r) => r.label)).toEqual(["S1", "S2", "S3"]);
    expect([...new Set(columns.map((c) => c.group))]).toEqual(["case", "combination", "envelope"]);
    expect(columns.filter((c) => c.group === "case").map((c) => c.key)).toEqual([
      "case:D:fy",
      "case:D:mz",
      "case:W:fy",
      "case:W:mz",
    ]);
    expect(columns.find((c) => c.key === "case:W:fy")?.category).toBe("wind");
  });

  it("flags uplift on the downward-pulling value only", () => {
    const { rows } = pivotReactions(sampleReactionTable());
    const s3 = rows.find((r) => r.label === "S3")!;
    expect(s3.hasUplift).toBe(true);
    expect([...s3.upliftKeys].sort()).toEqual(["case:W:fy", "combination:C1:fy", "envelope:*:fyMin"]);
    expect(rows.find((r) => r.label === "S2")!.hasUplift).toBe(false);
  });

  it("drops moment columns when every support is pinned and every moment is zero", () => {
    const table = sampleReactionTable();
    const pinned = {
      supports: table.supports.map((s) => ({ ...s, support: "pinned" })),
      rows: table.rows.map((r) => (r.kind === "envelope" ? { ...r, mzMax: 0, mzMin: 0 } : { ...r, mz: 0 })),
    };
    const { columns } = pivotReactions(pinned);
    expect(columns.some((c) => c.quantity.startsWith("mz"))).toBe(false);
  });

  it("keeps SI values untouched", () => {
    const { rows } = pivotReactions(sampleReactionTable());
    expect(rows[1]!.values[columnKey("combination", "C1", "fy")]).toBe(70_000);
  });

  it.each([
    [{ group: "case", id: "D", quantity: "fy" }, "D Fy"],
    [{ group: "envelope", id: "*", quantity: "fyMin" }, "All combinations Fy min"],
    [{ group: "envelope", id: "C2", quantity: "mzMax" }, "C2 envelope Mz max"],
  ] as const)("describes %o as %s", (column, expected) => {
    expect(describeColumn(column)).toBe(expected);
  });
});
