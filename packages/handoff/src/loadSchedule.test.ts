import { describe, expect, it } from "vitest";
import { applyLoadSchedule, parseLoadSchedule, type ScheduleErrorCode } from "./loadSchedule.js";
import { twoSpanModel } from "./testing/twoSpanBeam.js";
import { FT_M, KIP_N } from "./units.js";

// The fixture beam runs from x = 0 to 12 m with cases D, L, W and combinations C1, C2.
const model = twoSpanModel();
const csv = (...lines: string[]) => ["case,type,position,magnitude", ...lines].join("\n");

describe("parseLoadSchedule: good files", () => {
  it("converts every unit to SI", () => {
    const result = parseLoadSchedule(
      csv(
        "D,point,3 m,-12 kN",
        "D,distributed,0..6 m,-3 kN/m",
        "L,distributed,10..20 ft,2.5 kip/ft",
        "L,moment,1500 mm,15 kN·m",
        "W,moment,24 in,15 kN*m",
        "W,distributed,6..12 m,-3..-5 kN/m",
      ),
      model,
    );
    expect(result.errors).toEqual([]);
    expect(result.ok).toBe(true);
    expect(result.preview.rows.map((r) => r.load)).toEqual([
      { type: "point", x: 3, fy: -12000 },
      { type: "distributed", x1: 0, x2: 6, qy1: -3000, qy2: -3000 },
      // 1 kip/ft = 4448.2216152605 N / 0.3048 m (NIST SP 811 B.8, exact).
      { type: "distributed", x1: 10 * FT_M, x2: 20 * FT_M, qy1: (2.5 * KIP_N) / FT_M, qy2: (2.5 * KIP_N) / FT_M },
      { type: "moment", x: 1.5, mz: 15000 },
      { type: "moment", x: expect.closeTo(0.6096, 12), mz: 15000 },
      { type: "distributed", x1: 6, x2: 12, qy1: -3000, qy2: -5000 },
    ]);
    expect(result.preview.cases.map((c) => [c.id, c.loads.length, c.willCreate])).toEqual([
      ["D", 2, false],
      ["L", 2, false],
      ["W", 2, false],
    ]);
  });

  it("accepts columns in any order, a byte-order mark and blank lines", () => {
    const text = "\uFEFFMagnitude,Case,Type,Position\n\n-12 kN,D,point,3 m\n";
    const result = parseLoadSchedule(text, model);
    expect(result.ok).toBe(true);
    expect(result.preview.rows[0]).toMatchObject({ row: 3, caseId: "D", load: { type: "point", x: 3, fy: -12000 } });
  });

  it("flags a new case instead of failing when asked to create it", () => {
    const result = parseLoadSchedule(csv("S,distributed,0..12 m,-1 kN/m"), model, { unknownCase: "create" });
    expect(result.ok).toBe(true);
    expect(result.preview.cases).toEqual([{ id: "S", willCreate: true, loads: [expect.objectContaining({ qy1: -1000 })] }]);
    const next = applyLoadSchedule(model, result.preview, "snow");
    expect(next.loadCases.map((c) => c.id)).toEqual(["D", "L", "W", "S"]);
    expect(next.loadCases[3]?.category).toBe("snow");
    expect(model.loadCases).toHaveLength(3);
  });
});

describe("parseLoadSchedule: bad files apply nothing", () => {
  it.each<[string, string, number, string | null, ScheduleErrorCode]>([
    ["unknown magnitude unit", csv("D,point,3 m,-12 tonnes"), 2, "magnitude", "unknown-unit"],
    ["unknown position unit", csv("D,point,3 yd,-12 kN"), 2, "position", "unknown-unit"],
    ["no unit", csv("D,point,3,-12 kN"), 2, "position", "unknown-unit"],
    ["force unit on a distributed load", csv("D,distributed,0..6 m,-3 kN"), 2, "magnitude", "unit-mismatch"],
    ["non-numeric magnitude", csv("D,point,3 m,heavy kN"), 2, "magnitude", "not-a-number"],
    ["position past the end", csv("D,point,12.5 m,-12 kN"), 2, "position", "out-of-range"],
    ["negative position", csv("D,point,-1 m,-12 kN"), 2, "position", "out-of-range"],
    ["reversed range", csv("D,distributed,6..0 m,-3 kN/m"), 2, "position", "bad-range"],
    ["distributed load at one x", csv("D,distributed,6 m,-3 kN/m"), 2, "position", "bad-range"],
    ["unknown type", csv("D,torsion,6 m,-3 kN·m"), 2, "type", "unknown-type"],
    ["unknown case", csv("X,point,3 m,-12 kN"), 2, "case", "unknown-case"],
    ["a combination as case", csv("C1,point,3 m,-12 kN"), 2, "case", "bad-case-id"],
    ["empty value", csv("D,point,,-12 kN"), 2, "position", "missing-value"],
    ["too few values", csv("D,point,3 m"), 2, null, "wrong-columns"],
    ["wrong header", "case,kind,position,magnitude\nD,point,3 m,-12 kN", 1, null, "wrong-columns"],
    ["extra column", "case,type,position,magnitude,note\nD,point,3 m,-12 kN,x", 1, null, "wrong-columns"],
    ["header only", "case,type,position,magnitude\n", 0, null, "empty-file"],
    ["unclosed quote", csv('D,point,"3 m,-12 kN'), 2, null, "malformed-csv"],
  ])("reports %s with row and column", (_name, text, row, column, code) => {
    const result = parseLoadSchedule(text, model);
    expect(result.ok).toBe(false);
    expect(result.preview).toEqual({ rows: [], cases: [] });
    expect(result.errors[0]).toMatchObject({ row, column, code });
    expect(result.errors[0]?.message).toBeTruthy();
  });

  it("collects errors from every bad row, not only the first", () => {
    const result = parseLoadSchedule(csv("D,point,3 m,-12 kN", "D,point,30 m,-12 kN", "L,moment,2 m,5 kN/m"), model);
    expect(result.errors.map((e) => [e.row, e.code])).toEqual([
      [3, "out-of-range"],
      [4, "unit-mismatch"],
    ]);
    expect(result.preview.rows).toEqual([]);
  });

  it("refuses more rows than the limit", () => {
    const lines = Array.from({ length: 11 }, () => "D,point,3 m,-1 kN");
    expect(parseLoadSchedule(csv(...lines), model, { maxRows: 10 }).errors[0]?.code).toBe("too-many-rows");
  });
});
