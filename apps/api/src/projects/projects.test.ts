import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("projects", () => {
  it("creates a project with defaults, owned by its creator, and lists only the caller's projects", async () => {
    const { client } = await t.signUp("Owner");
    const { client: stranger } = await t.signUp("Stranger");
    const created = await client.post("/api/projects", { name: "Harbour Mill Lofts" });
    expect(created.status).toBe(201);
    expect(created.body.project).toMatchObject({
      name: "Harbour Mill Lofts",
      unitSystem: "si",
      compareThresholdPercent: 5,
      role: "owner",
    });
    expect((await client.get("/api/projects")).body.projects.map((p: { name: string }) => p.name)).toEqual(["Harbour Mill Lofts"]);
    expect((await stranger.get("/api/projects")).body.projects).toEqual([]);
  });

  it("renames and changes settings, keeping what was not sent", async () => {
    const { client } = await t.signUp("Renamer");
    const { project } = (await client.post("/api/projects", { name: "Old", unitSystem: "us" })).body;
    const res = await client.patch(`/api/projects/${project.id}`, { name: "New", compareThresholdPercent: 2.5 });
    expect(res.status).toBe(200);
    expect(res.body.project).toMatchObject({ name: "New", unitSystem: "us", compareThresholdPercent: 2.5 });
  });

  it("refuses an empty change and an out-of-range threshold, naming the field", async () => {
    const { client } = await t.signUp("Validator");
    const { project } = (await client.post("/api/projects", { name: "P" })).body;
    expect((await client.patch(`/api/projects/${project.id}`, {})).status).toBe(400);
    const res = await client.patch(`/api/projects/${project.id}`, { compareThresholdPercent: 400 });
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues[0].path).toBe("compareThresholdPercent");
  });

  it("deletes a project and everything in it", async () => {
    const { client } = await t.signUp("Deleter");
    const { project } = (await client.post("/api/projects", { name: "Doomed" })).body;
    expect((await client.delete(`/api/projects/${project.id}`)).status).toBe(204);
    expect((await client.get(`/api/projects/${project.id}`)).status).toBe(404);
  });

  it("answers 404 for a malformed or unknown project id alike", async () => {
    const { client } = await t.signUp("Prober");
    for (const id of ["not-a-uuid", "00000000-0000-4000-8000-000000000000"]) {
      const res = await client.get(`/api/projects/${id}`);
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe("not-found");
    }
  });

  it("answers an unknown API path with a JSON 404", async () => {
    const res = await t.client().get("/api/no-such-thing");
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not-found");
  });
});
