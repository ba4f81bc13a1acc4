import { solve } from "@spanwright/solver";
import { describe, expect, it } from "vitest";
import { buildReactionTable, describeRow, ReactionTableError, supportsWithUplift, type ReactionRow } from "./reactionTable.js";
import { response, twoSpanModel, twoSpanResult } from "./testing/twoSpanBeam.js";

const model = twoSpanModel();
const table = buildReactionTable(model, twoSpanResult(model));

function row(label: string, kind: ReactionRow["kind"], id: string): ReactionRow {
  const found = table.rows.find((r) => r.label === label && r.kind === kind && r.id === id);
  if (!found) throw new Error(`no row ${label} ${kind} ${id}`);
  return found;
}

describe("the two-span fixture itself", () => {
  it("superposes the one-span cases into the both-spans case", () => {
    // Two equal spans, UDL on both: M_B = -wL²/8, max deflection wL⁴/(185 EI) at 0.4215 L
    // (AISC Manual Table 3-23 case 29, from memory).
    const w = 1000;
    expect(response(-w, -w, 6).M).toBeCloseTo((-w * 36) / 8, 6);
    const peak = Math.min(...Array.from({ length: 601 }, (_, i) => response(-w, -w, i / 100).uy));
    // The handbook coefficient 1/185 is rounded (exactly 0.00542), so compare to 1 %.
    expect(peak / ((-w * 6 ** 4) / (185 * 2.0e11 * 8.0e-5))).toBeCloseTo(1, 2);
  });


  it("agrees with the solver on reactions, envelopes and stations", () => {
    const m = { ...model, stations: [0, 1.5, 4.2, 6, 7.3, 12] };
    const solved = solve(m);
    const closed = twoSpanResult(m, m.stations);
    const near = (a: number, b: number) => expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * 1e5);
    for (const id of ["D", "L", "W", "C1", "C2"]) {
      solved.results[id]!.reactions.forEach((r, i) => near(r.fy, closed.results[id]!.reactions[i]!.fy));
      solved.results[id]!.stations!.forEach((s, i) => near(s.M, closed.results[id]!.stations![i]!.M));
    }
    for (const id of ["C1", "C2", "*"]) {
      solved.envelopes[id]!.reactions.forEach((r, i) => {
        near(r.fyMax, closed.envelopes[id]!.reactions[i]!.fyMax);
        near(r.fyMin, closed.envelopes[id]!.reactions[i]!.fyMin);
      });
    }
  });
});

describe("buildReactionTable", () => {
  it("lists one row per support for every case, combination and envelope", () => {
    // 3 supports × (3 cases + 2 combinations + 3 envelopes: C1, C2, all)
    expect(table.supports.map((s) => s.label)).toEqual(["S1", "S2", "S3"]);
    expect(table.rows).toHaveLength(3 * 8);
  });

  it("gives 3/8 wL at the ends and 5/4 wL at the middle support for the dead load", () => {
    // Two equal spans, UDL: R = 0.375 wL, 1.25 wL, 0.375 wL (AISC Table 3-23 case 29, from memory).
    const wL = 3000 * 6;
    expect(row("S1", "case", "D")).toMatchObject({ kind: "case", category: "dead", uplift: false });
    expect((row("S1", "case", "D") as { fy: number }).fy).toBeCloseTo(0.375 * wL, 6);
    expect((row("S2", "case", "D") as { fy: number }).fy).toBeCloseTo(1.25 * wL, 6);
  });

  it("takes envelope max and min from the live-load pattern arrangements", () => {
    // C1 = 1.2 D + 1.6 L; L on one span only gives 7/16 wL and -1/16 wL at the ends
    // (AISC Table 3-23 case 30, from memory): S1 max 8100 + 21000, min 8100 - 3000 N.
    const env = row("S1", "envelope", "C1");
    expect(env.kind === "envelope" && [env.fyMax, env.fyMin]).toEqual([29100, 5100].map((v) => expect.closeTo(v, 6)));
    const mid = row("S2", "envelope", "C1");
    expect(mid.kind === "envelope" && [mid.fyMax, mid.fyMin]).toEqual([87000, 27000].map((v) => expect.closeTo(v, 6)));
  });

  it("flags uplift where the support pulls the beam down", () => {
    expect(row("S1", "case", "W").uplift).toBe(true);
    expect(row("S1", "combination", "C2").uplift).toBe(true);
    expect(row("S1", "envelope", "*").uplift).toBe(true);
    expect(row("S1", "combination", "C1").uplift).toBe(false);
    expect(supportsWithUplift(table).map((s) => s.label)).toEqual(["S1", "S2", "S3"]);
  });

  it("does not call rounding residue uplift", () => {
    const result = twoSpanResult(model);
    const residue = result.results.D!.reactions[0]!;
    residue.fy = -1e-9;
    const t = buildReactionTable(model, result);
    expect(t.rows.find((r) => r.kind === "case" && r.id === "D" && r.node === 0)?.uplift).toBe(false);
  });

  it("reports a missing result as a typed error", () => {
    const result = twoSpanResult(model);
    delete result.results.L;
    expect(() => buildReactionTable(model, result)).toThrow(ReactionTableError);
  });

  it.each([
    [row("S1", "case", "D"), "D (dead)"],
    [row("S1", "combination", "C1"), "C1"],
    [row("S1", "envelope", "*"), "envelope, all combinations"],
  ])("describes a row as %#", (r, text) => {
    expect(describeRow(r)).toBe(text);
  });
});
