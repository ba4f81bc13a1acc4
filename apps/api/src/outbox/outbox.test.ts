import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { teamProject } from "../handoffs/teamFixture.js";
import { createTestApp, type TestApp } from "../testing/index.js";

describe("outbox in development and tests", () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it("lists caught hand-off mail, newest first, with attachment names and sizes, to a project owner", async () => {
    const team = await teamProject(t);
    await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [{ email: "first@groundwork.example" }] });
    await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [{ email: "second@groundwork.example" }] });
    const res = await team.owner.client.get("/api/outbox");
    expect(res.status).toBe(200);
    const [newest, older] = res.body.messages;
    expect(newest.to).toEqual(["second@groundwork.example"]);
    expect(older.to).toEqual(["first@groundwork.example"]);
    expect(newest).toMatchObject({ from: "handoffs@spanwright.test", subject: "Support reactions: Harbour Workshop, Roof beam B2, revision 1" });
    expect(newest.attachments.map((a: { filename: string }) => a.filename)).toEqual(["roof-beam-b2-rev-1-reactions.csv", "roof-beam-b2-rev-1-report.pdf"]);
    for (const a of newest.attachments) expect(a.size).toBeGreaterThan(100);
    expect(newest.attachments[0]).not.toHaveProperty("contentBase64");
  });

  it("is for owners: a member who owns no project gets 403, an anonymous caller 401", async () => {
    const team = await teamProject(t);
    const res = await team.viewer.client.get("/api/outbox");
    expect([res.status, res.body.error.code]).toEqual([403, "forbidden"]);
    expect((await t.client().get("/api/outbox")).status).toBe(401);
  });
});

describe.each([
  ["in production", { NODE_ENV: "production", SERVE_WEB: "false" }],
  ["when switched off", { OUTBOX_ENABLED: "false" }],
  ["when mail goes to a real server", { SMTP_MODE: "smtp", SMTP_HOST: "127.0.0.1" }],
])("outbox %s", (_title, env) => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ env });
  });
  afterAll(() => t.close());

  it("answers 404, even to an owner", async () => {
    const owner = await t.signUp("Owner");
    await owner.client.post("/api/projects", { name: "Mine" });
    const res = await owner.client.get("/api/outbox");
    expect([res.status, res.body.error.code]).toEqual([404, "not-found"]);
  });
});
