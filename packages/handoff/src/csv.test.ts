import { solve } from "@spanwright/solver";
import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { exportFileName, reactionTableCsv, reactionTableSiCsv, SI_CSV_COLUMNS } from "./csv.js";
import { buildReactionTable } from "./reactionTable.js";
import { twoSpanModel } from "./testing/twoSpanBeam.js";
import { KIP_N } from "./units.js";

const model = twoSpanModel();
// The engine's own numbers: the exports must carry them unchanged.
const result = solve(model);
const table = buildReactionTable(model, result);

describe("reactionTableSiCsv", () => {
  const records = parse(reactionTableSiCsv(table), { columns: true }) as Array<Record<string, string>>;

  it("keeps the stable column names", () => {
    expect(Object.keys(records[0]!)).toEqual([...SI_CSV_COLUMNS]);
  });

  it("parses back to exactly the solver's reactions for every case and combination", () => {
    for (const id of ["D", "L", "W", "C1", "C2"]) {
      for (const r of result.results[id]!.reactions) {
        const rec = records.find((x) => x.id === id && Number(x.node) === r.node);
        expect(Number(rec?.fy_N)).toBe(r.fy);
        expect(Number(rec?.mz_Nm)).toBe(r.mz);
      }
    }
  });

  it("parses back to exactly the envelope max and min", () => {
    for (const id of ["C1", "C2", "*"]) {
      for (const r of result.envelopes[id]!.reactions) {
        const rec = records.find((x) => x.row_kind === "envelope" && x.id === id && Number(x.node) === r.node);
        expect([Number(rec?.fy_max_N), Number(rec?.fy_min_N)]).toEqual([r.fyMax, r.fyMin]);
        expect(rec?.fy_N).toBe("");
      }
    }
  });

  it("marks uplift rows", () => {
    const wind = records.find((x) => x.id === "W" && x.node === "0");
    expect(wind?.uplift).toBe("true");
    expect(Number(wind?.fy_N)).toBeLessThan(0);
  });
});

describe("reactionTableCsv", () => {
  it("puts SI project units in the header", () => {
    const [header] = parse(reactionTableCsv(table, { units: "si" })) as string[][];
    expect(header).toEqual(expect.arrayContaining(["x [m]", "Fy [kN]", "Mz [kN·m]", "Fy max [kN]"]));
  });

  it("writes one row per support and case, combination or envelope", () => {
    const rows = parse(reactionTableCsv(table, { units: "si" })) as string[][];
    expect(rows).toHaveLength(1 + 3 * 8);
  });

  it("converts to kip and kip·ft within the shown rounding", () => {
    const rows = parse(reactionTableCsv(table, { units: "us" }), { columns: true }) as Array<Record<string, string>>;
    expect(Object.keys(rows[0]!)).toEqual(expect.arrayContaining(["x [ft]", "Fy [kip]", "Mz [kip·ft]"]));
    const dead = rows.find((r) => r["Case or combination"] === "D (dead)" && r.Support === "S2");
    // 1 kip = 4448.2216152605 N exactly (NIST SP 811 B.8).
    expect(Math.abs(Number(dead?.["Fy [kip]"]) - result.results.D!.reactions[1]!.fy / KIP_N)).toBeLessThanOrEqual(0.0005);
    expect(dead?.["x [ft]"]).toBe((6 / 0.3048).toFixed(3));
  });

  it("shows kN values that parse back to the solver's numbers within half the last digit", () => {
    const rows = parse(reactionTableCsv(table, { units: "si", decimals: 3 }), { columns: true }) as Array<Record<string, string>>;
    for (const r of result.results.C1!.reactions) {
      const rec = rows.find((x) => x["Case or combination"] === "C1" && x.Support === `S${r.node + 1}`);
      expect(Math.abs(Number(rec?.["Fy [kN]"]) * 1000 - r.fy)).toBeLessThanOrEqual(0.5);
    }
  });
});

describe("exportFileName", () => {
  it.each([
    ["B2 grid C", 3, "reactions.csv", "b2-grid-c-rev-3-reactions.csv"],
    ["//", "", "report.pdf", "rev-report.pdf"],
  ])("turns %s rev %s into a safe name", (beam, rev, suffix, name) => {
    expect(exportFileName(beam, rev, suffix)).toBe(name);
  });
});
