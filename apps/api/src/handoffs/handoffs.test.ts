import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { beamRevisions, handoffs } from "../db/schema.js";
import { createTestApp, type TestApp } from "../testing/index.js";
import { liveModel, teamProject } from "./teamFixture.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const external = "piles@groundwork.example";

async function caughtFor(messageId: string) {
  const all = (await t.services.mailer.caught()) ?? [];
  return all.find((m) => m.messageId === messageId);
}

describe("hand-off", () => {
  it("e-mails the CSV and PDF through the local SMTP fake, records it and marks the revision issued", async () => {
    const team = await teamProject(t);
    const res = await team.engineer.client.post(`${team.revisions}/1/handoffs`, {
      recipients: [{ userId: team.viewer.userId }, { email: external }],
      message: "Reactions for the pile caps on grid C.",
    });
    expect(res.status).toBe(201);
    const { handoff } = res.body;
    expect(handoff).toMatchObject({
      version: 1,
      beamName: "Roof beam B2",
      issuedBy: { id: team.engineer.userId, name: "Tobias Engineer" },
      message: "Reactions for the pile caps on grid C.",
      latestVersion: 1,
      stale: false,
    });
    expect(handoff.recipients).toEqual(
      expect.arrayContaining([
        { email: team.viewer.email, userId: team.viewer.userId, name: "Oluwaseun Viewer", outdated: false },
        { email: external, userId: null, name: null, outdated: false },
      ]),
    );
    const mail = await caughtFor(handoff.messageId);
    expect(mail).toBeDefined();
    expect(new Set(mail!.to)).toEqual(new Set([team.viewer.email, external]));
    expect(mail!.subject).toBe("Support reactions: Harbour Workshop, Roof beam B2, revision 1");
    expect(mail!.text).toContain("Reactions for the pile caps on grid C.");
    expect(mail!.text).toContain(`/projects/${team.projectId}/beams/${team.beamId}/revisions/1`);
    const files = mail!.attachments.map((a) => [a.filename, a.contentType]);
    expect(files).toEqual([
      ["roof-beam-b2-rev-1-reactions.csv", "text/csv"],
      ["roof-beam-b2-rev-1-report.pdf", "application/pdf"],
    ]);
    expect(Buffer.from(mail!.attachments[1]!.contentBase64, "base64").subarray(0, 5).toString()).toBe("%PDF-");
    expect(Buffer.from(mail!.attachments[0]!.contentBase64, "base64").toString()).toContain("Fy [kN]");
    const revision = (await team.viewer.client.get(`${team.revisions}/1`)).body.revision;
    expect(revision.status).toBe("issued");
  });

  it("keeps an issued revision immutable: no check, no edit in the database", async () => {
    const team = await teamProject(t);
    await team.owner.client.post(`${team.revisions}/1/handoffs`, { recipients: [{ email: external }] });
    const check = await team.checker.client.post(`${team.revisions}/1/check`, { comment: "late" });
    expect([check.status, check.body.error.code]).toEqual([409, "already-checked"]);
    const where = eq(beamRevisions.beamId, team.beamId);
    await expect(t.database.db.update(beamRevisions).set({ model: { tampered: true } }).where(where)).rejects.toThrow();
    await expect(t.database.db.update(beamRevisions).set({ status: "draft" }).where(where)).rejects.toThrow();
    // editing goes on in a new revision
    expect((await team.engineer.client.post(team.revisions, { baseVersion: 1, model: liveModel(-11_000) })).status).toBe(201);
  });

  it("issues a checked revision too, keeping who checked it", async () => {
    const team = await teamProject(t);
    await team.checker.client.post(`${team.revisions}/1/check`, { comment: "fine" });
    await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [{ email: external }] });
    const revision = (await team.engineer.client.get(`${team.revisions}/1`)).body.revision;
    expect(revision).toMatchObject({ status: "issued", checkedBy: { name: "Ines Checker" } });
  });

  it.each([
    ["a member who is not a viewer", (team: Awaited<ReturnType<typeof teamProject>>) => ({ userId: team.checker.userId }), 422, "invalid-recipient"],
    ["a user outside the project", () => ({ userId: "00000000-0000-4000-8000-000000000000" }), 422, "invalid-recipient"],
    ["a malformed address", () => ({ email: "not an address" }), 400, "invalid-request"],
  ])("refuses %s, sending and recording nothing", async (_title, recipient, status, code) => {
    const team = await teamProject(t);
    const before = ((await t.services.mailer.caught()) ?? []).length;
    const res = await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [recipient(team)] });
    expect([res.status, res.body.error.code]).toEqual([status, code]);
    expect(((await t.services.mailer.caught()) ?? []).length).toBe(before);
    expect(await t.database.db.select().from(handoffs).where(eq(handoffs.beamId, team.beamId))).toEqual([]);
  });

  it("needs at least one recipient", async () => {
    const team = await teamProject(t);
    const res = await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [] });
    expect(res.status).toBe(400);
  });
});

describe("hand-off when the mail server refuses", () => {
  let down: TestApp;
  beforeAll(async () => {
    // port 1 on loopback: nothing listens, the connection is refused at once
    down = await createTestApp({ env: { SMTP_MODE: "smtp", SMTP_HOST: "127.0.0.1", SMTP_PORT: "1" } });
  });
  afterAll(() => down.close());

  it("answers 502 and records nothing; the revision stays a draft", async () => {
    const team = await teamProject(down);
    const res = await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [{ email: external }] });
    expect([res.status, res.body.error.code]).toEqual([502, "mail-failed"]);
    expect((await team.engineer.client.get(`${team.beamPath}/handoffs`)).body.handoffs).toEqual([]);
    expect((await team.engineer.client.get(`${team.revisions}/1`)).body.revision.status).toBe("draft");
  });
});

describe("stale hand-off alert", () => {
  it("flags a hand-off once a newer revision changes an issued reaction beyond the threshold", async () => {
    const team = await teamProject(t);
    await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [{ userId: team.viewer.userId }] });
    // L from 5 to 5.5 kN/m: every L reaction changes by 10 %, over the default 5 %
    await team.engineer.client.post(team.revisions, { baseVersion: 1, model: liveModel(-10_000, -5_500) });
    for (const path of [`${team.projectPath}/handoffs`, `${team.beamPath}/handoffs`]) {
      const [h] = (await team.viewer.client.get(path)).body.handoffs;
      expect(h).toMatchObject({ version: 1, latestVersion: 2, stale: true });
      expect(h.staleValueCount).toBeGreaterThan(0);
    }
  });

  it("does not flag a change within the threshold, and a re-issue is current", async () => {
    const team = await teamProject(t);
    await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [{ email: external }] });
    // D from 10 to 10.1 kN/m: reactions change by 1 % or less
    await team.engineer.client.post(team.revisions, { baseVersion: 1, model: liveModel(-10_100, -5_000) });
    let list = (await team.owner.client.get(`${team.beamPath}/handoffs`)).body.handoffs;
    expect(list[0]).toMatchObject({ version: 1, latestVersion: 2, stale: false, staleValueCount: 0 });
    await team.engineer.client.post(team.revisions, { baseVersion: 2, model: liveModel(-20_000, -5_000) });
    await team.engineer.client.post(`${team.revisions}/3/handoffs`, { recipients: [{ email: external }] });
    list = (await team.owner.client.get(`${team.projectPath}/handoffs`)).body.handoffs;
    expect(list.map((h: { version: number; stale: boolean }) => [h.version, h.stale])).toEqual([[3, false], [1, true]]);
    // the old hand-off is stale, but its recipient has the re-issued numbers
    expect(list[1].recipients[0].outdated).toBe(false);
  });

  it("names the recipients who still hold outdated reactions", async () => {
    const team = await teamProject(t);
    await team.engineer.client.post(`${team.revisions}/1/handoffs`, { recipients: [{ email: external }, { userId: team.viewer.userId }] });
    await team.engineer.client.post(team.revisions, { baseVersion: 1, model: liveModel(-10_000, -8_000) });
    await team.engineer.client.post(`${team.revisions}/2/handoffs`, { recipients: [{ email: external }] });
    await team.engineer.client.post(team.revisions, { baseVersion: 2, model: liveModel(-10_000, -8_100) });
    const list = (await team.viewer.client.get(`${team.projectPath}/handoffs`)).body.handoffs;
    const outdated = list.flatMap((h: { recipients: Array<{ email: string; outdated: boolean }> }) => h.recipients.filter((r) => r.outdated).map((r) => r.email));
    // revision 3 moves L by about 1 %, so revision 2's numbers are still current; revision 1's are not
    expect(outdated).toEqual([team.viewer.email]);
  });
});
