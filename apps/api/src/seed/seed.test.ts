import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../testing/index.js";
import { demoEmail, demoPassword, demoProjectName, seedDemo } from "./seed.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("demo seed", () => {
  it("creates the demo project once, solvable, with every role, and is idempotent", async () => {
    expect(await seedDemo(t.services, t.database.db)).toEqual({ created: true });
    expect(await seedDemo(t.services, t.database.db)).toEqual({ created: false });

    const c = t.client();
    expect((await c.post("/api/auth/sign-in", { email: demoEmail, password: demoPassword })).status).toBe(200);
    const projects = (await c.get("/api/projects")).body.projects;
    expect(projects).toEqual([expect.objectContaining({ name: demoProjectName, role: "owner" })]);
    const base = `/api/projects/${projects[0].id}`;
    const roles = (await c.get(`${base}/members`)).body.members.map((m: { role: string }) => m.role).sort();
    expect(roles).toEqual(["checker", "engineer", "owner", "viewer"]);
    const beams = (await c.get(`${base}/beams`)).body.beams;
    expect(beams).toHaveLength(3);
    const roof = beams.find((b: { name: string }) => b.name.startsWith("RB-2"));
    const revisions = (await c.get(`${base}/beams/${roof.id}/revisions`)).body.revisions;
    expect(revisions.map((r: { version: number; status: string }) => [r.version, r.status])).toEqual([
      [2, "draft"],
      [1, "checked"],
    ]);
  });
});
