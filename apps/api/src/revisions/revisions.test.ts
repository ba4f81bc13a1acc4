import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { beamRevisions } from "../db/schema.js";
import { createTestApp, invalidModel, twoSpanModel, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function beamWithTeam() {
  const owner = await t.signUp("Owner");
  const checker = await t.signUp("Checker");
  const { project } = (await owner.client.post("/api/projects", { name: "Revisions test" })).body;
  await owner.client.post(`/api/projects/${project.id}/members`, { email: checker.email, role: "checker" });
  const { beam } = (await owner.client.post(`/api/projects/${project.id}/beams`, { name: "B", model: twoSpanModel() })).body;
  return { owner, checker, base: `/api/projects/${project.id}/beams/${beam.id}/revisions`, beamPath: `/api/projects/${project.id}/beams/${beam.id}` };
}

describe("revisions", () => {
  it("saves revision 2 on top of 1 with its own result, keeping revision 1 unchanged", async () => {
    const { owner, base, beamPath } = await beamWithTeam();
    const res = await owner.client.post(base, { baseVersion: 1, model: twoSpanModel(-20_000), changeSummary: "heavier partition" });
    expect(res.status).toBe(201);
    // the author's note, then the server's summary of the model diff against revision 1
    expect(res.body.revision).toMatchObject({
      version: 2,
      changeSummary: "heavier partition: D: -10 kN/m -> -20 kN/m on spans 1-2 (x = 0..10 m)",
      status: "draft",
    });
    // two equal 5 m spans: end reaction 3wL/8 (AISC Manual Table 3-23, two equal spans, uniform load);
    // twice the load, twice the reaction
    expect(res.body.revision.result.results.D.reactions[0].fy).toBeCloseTo(37_500, 6);
    // the save's answer is built from what was written: a read of the revision gives the same
    expect((await owner.client.get(`${base}/2`)).body.revision).toEqual(res.body.revision);
    const first = (await owner.client.get(`${base}/1`)).body.revision;
    expect(first.result.results.D.reactions[0].fy).toBeCloseTo(18_750, 6);
    expect((await owner.client.get(beamPath)).body.beam.latestVersion).toBe(2);
    const list = (await owner.client.get(base)).body.revisions;
    expect(list.map((r: { version: number }) => r.version)).toEqual([2, 1]);
    expect(list[0]).not.toHaveProperty("model");
  });

  it("answers a stale baseVersion with 409 and the current revision, never overwriting", async () => {
    const { owner, base } = await beamWithTeam();
    await owner.client.post(base, { baseVersion: 1, model: twoSpanModel(-20_000) });
    const stale = await owner.client.post(base, { baseVersion: 1, model: twoSpanModel(-30_000) });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("version-conflict");
    expect(stale.body.error.details.current.version).toBe(2);
    expect(stale.body.error.details.current.model).toEqual(twoSpanModel(-20_000));
    expect((await owner.client.get(base)).body.revisions).toHaveLength(2);
  });

  it("lets exactly one of two simultaneous saves on the same base win", async () => {
    const { owner, base } = await beamWithTeam();
    const results = await Promise.all(
      [-11_000, -12_000, -13_000, -14_000].map((q) => owner.client.post(base, { baseVersion: 1, model: twoSpanModel(q) })),
    );
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([201, 409, 409, 409]);
    expect((await owner.client.get(base)).body.revisions).toHaveLength(2);
  });

  it("answers a viewer's save with 403 and an unknown beam with 404 before looking at the model", async () => {
    const { owner, base, beamPath } = await beamWithTeam();
    const viewer = await t.signUp("Viewer");
    const projectPath = beamPath.split("/beams/")[0]!;
    await owner.client.post(`${projectPath}/members`, { email: viewer.email, role: "viewer" });
    const byViewer = await viewer.client.post(base, { baseVersion: 1, model: invalidModel() });
    expect(byViewer.status).toBe(403);
    const unknownBeam = await owner.client.post(`${projectPath}/beams/00000000-0000-4000-8000-000000000000/revisions`, { baseVersion: 1, model: invalidModel() });
    expect(unknownBeam.status).toBe(404);
    expect((await owner.client.get(beamPath)).body.beam.latestVersion).toBe(1);
  });

  it("answers 422 for an invalid model and keeps the version where it was", async () => {
    const { owner, base } = await beamWithTeam();
    const res = await owner.client.post(base, { baseVersion: 1, model: invalidModel() });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid-model");
    expect((await owner.client.post(base, { baseVersion: 1, model: twoSpanModel() })).status).toBe(201);
  });

  it("lets a checker mark a revision checked with a comment, once", async () => {
    const { checker, base } = await beamWithTeam();
    const res = await checker.client.post(`${base}/1/check`, { comment: "Reactions agree with hand check" });
    expect(res.status).toBe(200);
    expect(res.body.revision).toMatchObject({
      status: "checked",
      checkedBy: { id: checker.userId, name: "Checker" },
      checkComment: "Reactions agree with hand check",
    });
    const again = await checker.client.post(`${base}/1/check`, {});
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe("already-checked");
  });

  it("answers 404 for a revision that does not exist or a malformed version", async () => {
    const { owner, base } = await beamWithTeam();
    expect((await owner.client.get(`${base}/7`)).status).toBe(404);
    expect((await owner.client.get(`${base}/x`)).status).toBe(404);
  });

  it("refuses a baseVersion beyond what a stored version can hold with 400 naming it", async () => {
    const { owner, base, beamPath } = await beamWithTeam();
    // 2^53 - 1 passed JSON and zod's int(); the database's integer column cannot hold it
    const res = await owner.client.post(base, { baseVersion: Number.MAX_SAFE_INTEGER, model: {} });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error)).toContain("baseVersion");
    expect((await owner.client.get(beamPath)).body.beam.latestVersion).toBe(1);
  });

  it("names baseVersion when it is missing", async () => {
    const { owner, base } = await beamWithTeam();
    const res = await owner.client.post(base, { model: twoSpanModel() });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain("baseVersion");
  });

  it("is guarded by the database too: a saved model and a checked revision cannot be updated", async () => {
    const { checker, base } = await beamWithTeam();
    const { db } = t.database;
    const beamId = base.split("/")[5]!;
    const where = eq(beamRevisions.beamId, beamId);
    await expect(db.update(beamRevisions).set({ model: { tampered: true } }).where(where)).rejects.toThrow();
    await checker.client.post(`${base}/1/check`, { comment: "fine" });
    await expect(db.update(beamRevisions).set({ checkComment: "rewritten" }).where(where)).rejects.toThrow();
    await expect(db.update(beamRevisions).set({ status: "draft", checkedById: null, checkedAt: null }).where(where)).rejects.toThrow();
  });
});
