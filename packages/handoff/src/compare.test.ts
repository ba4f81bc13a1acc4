import { describe, expect, it } from "vitest";
import { compareReactionTables, staleReactions } from "./compare.js";
import type { BeamModel } from "./exchange.js";
import { buildReactionTable } from "./reactionTable.js";
import { twoSpanModel, twoSpanResult } from "./testing/twoSpanBeam.js";

function tableWith(change: (m: BeamModel) => void = () => undefined) {
  const model = twoSpanModel();
  change(model);
  return buildReactionTable(model, twoSpanResult(model));
}

const issued = tableWith();
const setDead = (qy: number) => (m: BeamModel) => {
  m.loadCases[0]!.loads = [{ type: "distributed", x1: 0, x2: 12, qy1: qy, qy2: qy }];
};

describe("compareReactionTables", () => {
  it("flags nothing for the same table", () => {
    const c = compareReactionTables(issued, tableWith());
    expect(c.flagged).toEqual([]);
    expect(c.values.every((v) => v.change === 0)).toBe(true);
  });

  it("gives absolute and percent change per value", () => {
    // Dead load 3 -> 3.3 kN/m: every dead-load reaction grows by exactly 10 % (linear elasticity).
    const c = compareReactionTables(issued, tableWith(setDead(-3300)));
    const middle = c.values.find((v) => v.label === "S2" && v.kind === "case" && v.id === "D" && v.quantity === "fy");
    // Two equal spans, UDL: R_B = 1.25 wL (AISC Table 3-23 case 29, from memory): 1.25 × 300 × 6 N.
    expect(middle?.change).toBeCloseTo(2250, 6);
    expect(middle?.changePct).toBeCloseTo(10, 9);
    expect(middle?.flagged).toBe(true);
  });

  it("leaves changes within the threshold unflagged", () => {
    // 3 -> 3.12 kN/m is +4 % on dead-load reactions, below the 5 % default.
    const c = compareReactionTables(issued, tableWith(setDead(-3120)));
    expect(c.values.find((v) => v.kind === "case" && v.id === "D" && v.quantity === "fy")?.changePct).toBeCloseTo(4, 9);
    expect(c.flagged.filter((v) => v.kind === "case")).toEqual([]);
    expect(compareReactionTables(issued, tableWith(setDead(-3120)), 3).flagged.length).toBeGreaterThan(0);
  });

  it("has no percent for a value that was zero", () => {
    const c = compareReactionTables(issued, tableWith());
    const mz = c.values.find((v) => v.quantity === "mz");
    expect(mz).toMatchObject({ before: 0, after: 0, changePct: null, flagged: false });
  });

  it("reports supports added and removed, with their values flagged", () => {
    // The last support moved from x = 12 m to 13 m: to the compare it is one removed, one added.
    const moved = {
      supports: issued.supports.map((s) => (s.node === 2 ? { ...s, x: 13 } : s)),
      rows: issued.rows.map((r) => (r.node === 2 ? { ...r, x: 13 } : r)),
    };
    const c = compareReactionTables(issued, moved);
    expect(c.supports.map((s) => [s.x, s.status])).toEqual([
      [0, "kept"],
      [6, "kept"],
      [12, "removed"],
      [13, "added"],
    ]);
    expect(c.values.filter((v) => v.x === 12).every((v) => v.after === null && v.flagged)).toBe(true);
  });
});

describe("staleReactions", () => {
  it("is not stale for changes within the threshold", () => {
    // Every load 4 % heavier: every reaction 4 % larger (linear elasticity), below 5 %.
    const heavier = tableWith((m) => {
      for (const lc of m.loadCases) {
        lc.loads = lc.loads.map((l) => (l.type === "distributed" ? { ...l, qy1: 1.04 * l.qy1, qy2: 1.04 * l.qy2 } : l));
      }
    });
    expect(staleReactions(issued, heavier).stale).toBe(false);
    expect(staleReactions(issued, heavier, 3).stale).toBe(true);
  });

  it("is stale when an issued reaction changes beyond the threshold", () => {
    const verdict = staleReactions(issued, tableWith(setDead(-3300)), 5);
    expect(verdict.stale).toBe(true);
    expect(verdict.changed.some((v) => v.id === "D")).toBe(true);
  });

  it("is stale when an issued combination disappears", () => {
    const verdict = staleReactions(issued, tableWith((m) => m.combinations.pop()));
    expect(verdict.stale).toBe(true);
    expect(verdict.changed.filter((v) => v.id === "C2").every((v) => v.after === null)).toBe(true);
    expect(verdict.changed.some((v) => v.id === "C2" && v.kind === "combination")).toBe(true);
  });

  it("is not stale when only a new load case appears", () => {
    const verdict = staleReactions(issued, tableWith((m) => m.loadCases.push({ id: "S", category: "snow", loads: [] })));
    expect(verdict.stale).toBe(false);
  });
});
