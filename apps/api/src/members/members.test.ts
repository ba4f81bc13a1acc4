import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { listMembers } from "./members.repo.js";
import { createTestApp, testPassword, uniqueEmail, verificationToken, type TestApp } from "../testing/index.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function projectWithOwner() {
  const owner = await t.signUp("Owner");
  const { project } = (await owner.client.post("/api/projects", { name: "Members test" })).body;
  return { owner, projectId: project.id as string, base: `/api/projects/${project.id}/members` };
}

describe("members", () => {
  it("invites an existing user by e-mail with a role; the project then shows in their list", async () => {
    const { owner, projectId, base } = await projectWithOwner();
    const eng = await t.signUp("Engineer");
    const res = await owner.client.post(base, { email: eng.email.toUpperCase(), role: "engineer" });
    expect(res.status).toBe(201);
    expect(res.body.member).toMatchObject({ userId: eng.userId, role: "engineer", pending: false });
    const projects = (await eng.client.get("/api/projects")).body.projects;
    expect(projects).toEqual([expect.objectContaining({ id: projectId, role: "engineer" })]);
    const again = await owner.client.post(base, { email: eng.email, role: "viewer" });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe("already-member");
  });

  it("invites an e-mail without an account as a pending member who joins on sign-up and verifying the address", async () => {
    const { owner, projectId, base } = await projectWithOwner();
    const email = uniqueEmail("newcomer");
    const invited = await owner.client.post(base, { email, role: "checker" });
    expect(invited.status).toBe(201);
    expect(invited.body.member).toMatchObject({ email, role: "checker", pending: true });
    expect((await t.client().post("/api/auth/sign-in", { email, password: testPassword })).status).toBe(401);

    const joined = await t.signUp("Newcomer", email);
    expect(joined.userId).toBe(invited.body.member.userId);
    expect((await joined.client.get("/api/projects")).body.projects).toEqual([]);
    const token = await verificationToken(t.services.mailer, email);
    expect((await t.client().post("/api/auth/verify-email", { token })).status).toBe(200);
    const projects = (await joined.client.get("/api/projects")).body.projects;
    expect(projects).toEqual([expect.objectContaining({ id: projectId, role: "checker" })]);
    const members = (await owner.client.get(base)).body.members;
    expect(members.find((m: { email: string }) => m.email === email)).toMatchObject({ pending: false, name: "Newcomer" });
  });

  it("changes a role and removes a member", async () => {
    const { owner, base } = await projectWithOwner();
    const v = await t.signUp("Viewer");
    await owner.client.post(base, { email: v.email, role: "viewer" });
    const changed = await owner.client.patch(`${base}/${v.userId}`, { role: "checker" });
    expect(changed.status).toBe(200);
    expect(changed.body.member.role).toBe("checker");
    expect((await owner.client.delete(`${base}/${v.userId}`)).status).toBe(204);
    expect((await v.client.get("/api/projects")).body.projects).toEqual([]);
    expect((await owner.client.delete(`${base}/${v.userId}`)).status).toBe(404);
  });

  it("refuses to remove or demote the last owner, and allows it once there is another", async () => {
    const { owner, base } = await projectWithOwner();
    for (const res of [
      await owner.client.delete(`${base}/${owner.userId}`),
      await owner.client.patch(`${base}/${owner.userId}`, { role: "engineer" }),
    ]) {
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe("last-owner");
    }
    const second = await t.signUp("Second owner");
    await owner.client.post(base, { email: second.email, role: "owner" });
    expect((await owner.client.patch(`${base}/${owner.userId}`, { role: "engineer" })).status).toBe(200);
    // the demoted former owner may no longer manage members
    const denied = await owner.client.delete(`${base}/${second.userId}`);
    expect(denied.status).toBe(403);
    expect(denied.body.error.code).toBe("forbidden");
  });

  it("keeps one owner when two owners demote each other at the same moment", async () => {
    const { owner, base } = await projectWithOwner();
    const second = await t.signUp("Co-owner");
    await owner.client.post(base, { email: second.email, role: "owner" });
    const results = await Promise.all([
      owner.client.patch(`${base}/${second.userId}`, { role: "viewer" }),
      second.client.patch(`${base}/${owner.userId}`, { role: "viewer" }),
    ]);
    const members = await listMembers(t.database.db, base.split("/")[3]!);
    expect(members.filter((m) => m.role === "owner")).toHaveLength(1);
    const [first, other] = results.map((r) => r.status).sort();
    expect(first).toBe(200);
    expect([403, 409]).toContain(other);
  });

  it("rejects an unknown role naming the field", async () => {
    const { owner, base } = await projectWithOwner();
    const res = await owner.client.post(base, { email: uniqueEmail("x"), role: "admin" });
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues.map((i: { path: string }) => i.path)).toEqual(["role"]);
  });
});
