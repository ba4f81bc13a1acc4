import { describe, expect, it } from "vitest";
import { copyText, reactionTableToTsv } from "./copyAsTable";
import { pivotReactions } from "./pivotReactions";
import { KIP_N, unitsFor } from "./reactionUnits";
import { sampleReactionTable } from "./testTables";

describe("copy as table", () => {
  it("writes a tab-separated header with units and one line per support", () => {
    const { columns, rows } = pivotReactions(sampleReactionTable());
    const picked = columns.filter((c) => c.key === "case:D:fy" || c.key === "envelope:*:fyMin");
    const text = reactionTableToTsv(picked, rows, unitsFor("si"));
    expect(text.split("\n")).toEqual([
      "Support\tx (m)\tType\tD Fy (kN)\tAll combinations Fy min (kN)\tUplift",
      "S1\t0\tfixed\t20.000\t20.000\tno",
      "S2\t6\tpinned\t50.000\t50.000\tno",
      "S3\t12\tpinned\t10.000\t-1.000\tyes",
    ]);
  });

  it("converts to the project's US units, positions in feet", () => {
    const table = sampleReactionTable();
    // S2 at 6 m carries exactly 10 kip of dead load here.
    const scaled = { ...table, rows: table.rows.map((r) => (r.kind === "case" && r.id === "D" && r.node === 1 ? { ...r, fy: 10 * KIP_N } : r)) };
    const { columns, rows } = pivotReactions(scaled);
    const text = reactionTableToTsv(columns.filter((c) => c.key === "case:D:fy"), rows, unitsFor("us"));
    const lines = text.split("\n");
    expect(lines[0]).toBe("Support\tx (ft)\tType\tD Fy (kip)\tUplift");
    // 6 m / 0.3048 m/ft = 19.6850393700787 ft.
    expect(lines[2]).toBe("S2\t19.6850393701\tpinned\t10.000\tno");
  });

  it("keeps a support label with a tab in one cell", () => {
    const { columns, rows } = pivotReactions(sampleReactionTable());
    const text = reactionTableToTsv(columns.slice(0, 1), [{ ...rows[0]!, label: "S1\tgrid A" }], unitsFor("si"));
    expect(text.split("\n")[1]!.split("\t")).toHaveLength(5);
  });

  it("reports a refused clipboard instead of throwing", async () => {
    const refusing = { writeText: () => Promise.reject(new Error("denied")) };
    const written: string[] = [];
    const accepting = { writeText: (t: string) => (written.push(t), Promise.resolve()) };
    expect(await copyText("a\tb", refusing)).toBe(false);
    expect(await copyText("a\tb", accepting)).toBe(true);
    expect(written).toEqual(["a\tb"]);
    expect(await copyText("x", null)).toBe(false);
  });
});
