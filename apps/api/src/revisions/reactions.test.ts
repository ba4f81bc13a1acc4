import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { liveModel, teamProject } from "../handoffs/teamFixture.js";
import { createTestApp, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

type Row = { kind: string; id: string; label: string; fy?: number; fyMax?: number; fyMin?: number; uplift: boolean };
type Change = { label: string; kind: string; id: string; quantity: string; before: number; after: number; change: number; changePct: number; flagged: boolean };

describe("reaction table", () => {
  it("gives each support's reaction per case, combination and envelope, equal to the stored solver result", async () => {
    const { engineer, revisions } = await teamProject(t);
    const res = await engineer.client.get(`${revisions}/1/reactions`);
    expect(res.status).toBe(200);
    const { table, units, version } = res.body;
    expect(version).toBe(1);
    expect(units).toMatchObject({ system: "si", force: { label: "kN", toSI: 1000 }, moment: { label: "kN·m" } });
    expect(table.supports.map((s: { label: string }) => s.label)).toEqual(["S1", "S2", "S3"]);
    // two equal spans L = 5 m under w = 10 kN/m: R_end = 3/8 wL = 18.75 kN, R_mid = 5/4 wL = 62.5 kN
    // (two-span continuous beam table, e.g. AISC Manual Table 3-22 case 29; from memory)
    const dead = (label: string) => table.rows.find((r: Row) => r.kind === "case" && r.id === "D" && r.label === label);
    expect(dead("S1").fy).toBeCloseTo(18_750, 6);
    expect(dead("S2").fy).toBeCloseTo(62_500, 6);
    const stored = (await engineer.client.get(`${revisions}/1`)).body.revision.result;
    const combo = table.rows.find((r: Row) => r.kind === "combination" && r.id === "C1" && r.label === "S2");
    expect(combo.fy).toBe(stored.results.C1.reactions[1].fy);
    const envelope = table.rows.filter((r: Row) => r.kind === "envelope").map((r: Row) => r.id);
    expect(new Set(envelope)).toEqual(new Set(["C1", "*"]));
  });

  it("flags uplift when only one span is loaded", async () => {
    const { engineer, revisions } = await teamProject(t);
    const model = liveModel(-10_000, 0);
    (model.loadCases as Array<{ loads: Array<Record<string, number>> }>)[0]!.loads[0]!.x2 = 5;
    await engineer.client.post(revisions, { baseVersion: 1, model });
    const res = await engineer.client.get(`${revisions}/2/reactions`);
    // one span loaded: R_C = -1/16 wL, the far support holds the beam down (same table, case 30; from memory)
    const far = res.body.table.rows.find((r: Row) => r.kind === "case" && r.id === "D" && r.label === "S3");
    expect(far.fy).toBeCloseTo(-50_000 / 16, 6);
    expect(far.uplift).toBe(true);
    expect(res.body.upliftSupports).toContain("S3");
  });

  it("labels values in the project's units: a US project shows kip", async () => {
    const { viewer, revisions } = await teamProject(t, { unitSystem: "us" });
    const res = await viewer.client.get(`${revisions}/1/reactions`);
    expect(res.body.units.force.label).toBe("kip");
    expect(res.body.units.length.label).toBe("ft");
  });
});

describe("revision history", () => {
  it("lists author name, time, generated summary and status; a check does not stop new revisions", async () => {
    const { engineer, checker, revisions } = await teamProject(t);
    await checker.client.post(`${revisions}/1/check`, { comment: "agrees with hand check" });
    const saved = await engineer.client.post(revisions, { baseVersion: 1, model: liveModel(-10_000, -7_000) });
    expect(saved.status).toBe(201);
    const list = (await engineer.client.get(revisions)).body.revisions;
    expect(list.map((r: { version: number; status: string }) => [r.version, r.status])).toEqual([[2, "draft"], [1, "checked"]]);
    expect(list[0].author.name).toBe("Tobias Engineer");
    expect(list[0].changeSummary).toBe("L: -5 kN/m -> -7 kN/m on spans 1-2 (x = 0..10 m)");
    expect(Date.parse(list[0].createdAt)).not.toBeNaN();
  });

  it("says so when a save changes nothing in the model", async () => {
    const { engineer, revisions } = await teamProject(t);
    const res = await engineer.client.post(revisions, { baseVersion: 1, model: liveModel() });
    expect(res.body.revision.changeSummary).toBe("no model changes");
  });
});

describe("compare", () => {
  it("shows absolute and percent change per value, flagged beyond the project's threshold, and the model diff", async () => {
    const { engineer, revisions } = await teamProject(t);
    await engineer.client.post(revisions, { baseVersion: 1, model: liveModel(-10_000, -5_500) });
    const res = await engineer.client.get(`${revisions}/compare?from=2&to=1`);
    expect(res.status).toBe(200);
    expect([res.body.from, res.body.to, res.body.thresholdPercent]).toEqual([1, 2, 5]);
    const value = (kind: string, id: string, label: string, quantity = "fy") =>
      res.body.values.find((v: Change) => v.kind === kind && v.id === id && v.label === label && v.quantity === quantity) as Change;
    // L from 5 to 5.5 kN/m: every L reaction grows by 10 %; D is unchanged
    expect(value("case", "L", "S1").changePct).toBeCloseTo(10, 9);
    expect(value("case", "L", "S1").change).toBeCloseTo(-0.375 * 500 * 5 * -1, 6);
    expect(value("case", "L", "S1").flagged).toBe(true);
    expect(value("case", "D", "S2")).toMatchObject({ change: 0, changePct: 0, flagged: false });
    // C1 = 1.2 D + 1.6 L: 12 + 8 = 20 kN/m becomes 12 + 8.8 = 20.8 kN/m, +4 %, under the 5 % threshold
    expect(value("combination", "C1", "S1").changePct).toBeCloseTo(4, 9);
    expect(value("combination", "C1", "S1").flagged).toBe(false);
    expect(res.body.flaggedCount).toBe(res.body.values.filter((v: Change) => v.flagged).length);
    expect(res.body.modelDiff.summary).toEqual(["L: -5 kN/m -> -5.5 kN/m on spans 1-2 (x = 0..10 m)"]);
    expect(res.body.modelDiff.changes[0].kind).toBe("load-changed");
  });

  it("uses the project's threshold: at 3 % the same 4 % change is flagged", async () => {
    const { owner, engineer, revisions, projectPath } = await teamProject(t);
    await owner.client.patch(projectPath, { compareThresholdPercent: 3 });
    await engineer.client.post(revisions, { baseVersion: 1, model: liveModel(-10_000, -5_500) });
    const res = await engineer.client.get(`${revisions}/compare?from=1&to=2`);
    const c1 = res.body.values.find((v: Change) => v.kind === "combination" && v.id === "C1" && v.label === "S1" && v.quantity === "fy");
    expect(c1.flagged).toBe(true);
  });

  it("answers 400 naming the field for a missing or malformed version and 404 for an unknown one", async () => {
    const { viewer, revisions } = await teamProject(t);
    const missing = await viewer.client.get(`${revisions}/compare?from=1`);
    expect(missing.status).toBe(400);
    expect(missing.body.error.details.issues[0].path).toBe("to");
    expect((await viewer.client.get(`${revisions}/compare?from=1&to=x`)).status).toBe(400);
    expect((await viewer.client.get(`${revisions}/compare?from=1&to=9`)).status).toBe(404);
  });
});
