import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { emailVerifications } from "../db/schema.js";
import { createTestApp, findVerificationLink, testPassword, uniqueEmail, verificationToken, type TestApp } from "../testing/index.js";
import { sessionIdFromToken } from "./sessionToken.js";
import { verificationLifetimeMs } from "./emailVerification.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** An owner's project with `email` invited as an engineer before that address has an account. */
async function invitedProject(email = uniqueEmail("invitee")) {
  const owner = await t.signUp("Owner Ana");
  const { project } = (await owner.client.post("/api/projects", { name: "Quay shed" })).body;
  const invited = await owner.client.post(`/api/projects/${project.id}/members`, { email, role: "engineer" });
  expect(invited.status).toBe(201);
  return { owner, email, projectId: project.id as string, projectPath: `/api/projects/${project.id}` };
}

const mailsTo = async (email: string) => ((await t.services.mailer.caught()) ?? []).filter((m) => m.to.some((to) => to.includes(email)));

describe("signing up with an invited e-mail", () => {
  it("signs in at once but opens the invitation only after the mailed link is followed", async () => {
    const { owner, email, projectId, projectPath } = await invitedProject();
    const claimant = await t.signUp("Claimant", email);

    const me = await claimant.client.get("/api/me");
    expect(me.body.user).toMatchObject({ email, emailVerified: false });
    // refused exactly like a non-member: the project's existence is not revealed
    const before = await claimant.client.get(projectPath);
    expect([before.status, before.body.error.code]).toEqual([404, "not-found"]);
    expect((await claimant.client.get(`${projectPath}/beams`)).status).toBe(404);
    expect((await claimant.client.get("/api/projects")).body.projects).toEqual([]);
    const pending = (await owner.client.get(`${projectPath}/members`)).body.members.find((m: { email: string }) => m.email === email);
    expect(pending).toMatchObject({ pending: true });

    const link = await findVerificationLink(t.services.mailer, email);
    expect(link?.origin).toBe(t.config.publicUrl);
    expect(link?.pathname).toBe("/verify-email");
    const verified = await t.client().post("/api/auth/verify-email", { token: link!.searchParams.get("token") });
    expect(verified.status).toBe(200);
    expect(verified.body).toEqual({ email });

    expect((await claimant.client.get("/api/me")).body.user.emailVerified).toBe(true);
    const after = await claimant.client.get(projectPath);
    expect([after.status, after.body.project.role]).toEqual([200, "engineer"]);
    expect((await claimant.client.get("/api/projects")).body.projects).toEqual([expect.objectContaining({ id: projectId })]);
    const joined = (await owner.client.get(`${projectPath}/members`)).body.members.find((m: { email: string }) => m.email === email);
    expect(joined).toMatchObject({ pending: false, name: "Claimant" });
  });

  it("stores only the hash of the token, and each link works once", async () => {
    const { email } = await invitedProject();
    await t.signUp("Once", email);
    const token = await verificationToken(t.services.mailer, email);
    const ids = (await t.database.db.select({ id: emailVerifications.id }).from(emailVerifications)).map((r) => r.id);
    expect(ids).toContain(sessionIdFromToken(token));
    expect(ids).not.toContain(token);

    expect((await t.client().post("/api/auth/verify-email", { token })).status).toBe(200);
    const again = await t.client().post("/api/auth/verify-email", { token });
    expect([again.status, again.body.error.code]).toEqual([400, "verification-token-invalid"]);
  });

  it("answers an unknown token with 400 and a malformed body with 400 invalid-request", async () => {
    const unknown = await t.client().post("/api/auth/verify-email", { token: "a".repeat(32) });
    expect([unknown.status, unknown.body.error.code]).toEqual([400, "verification-token-invalid"]);
    const malformed = await t.client().post("/api/auth/verify-email", { token: "" });
    expect([malformed.status, malformed.body.error.code]).toEqual([400, "invalid-request"]);
  });

  it("refuses a link past its 48 hours with 422 and keeps the invitation closed", async () => {
    const { email, projectPath } = await invitedProject();
    const claimant = await t.signUp("Late", email);
    const token = await verificationToken(t.services.mailer, email);
    t.clock.advance(verificationLifetimeMs + 1000);
    try {
      const res = await t.client().post("/api/auth/verify-email", { token });
      expect([res.status, res.body.error.code]).toEqual([422, "verification-token-expired"]);
    } finally {
      t.clock.advance(-(verificationLifetimeMs + 1000));
    }
    expect((await claimant.client.get(projectPath)).status).toBe(404);
  });

  it("mails a new link on request; only the newest works", async () => {
    const { email, projectPath } = await invitedProject();
    const claimant = await t.signUp("Resender", email);
    const first = await verificationToken(t.services.mailer, email);
    expect((await claimant.client.post("/api/auth/verify-email/resend")).status).toBe(204);
    expect(await mailsTo(email)).toHaveLength(2);
    const second = await verificationToken(t.services.mailer, email);
    expect(second).not.toBe(first);

    expect((await t.client().post("/api/auth/verify-email", { token: first })).body.error.code).toBe("verification-token-invalid");
    expect((await t.client().post("/api/auth/verify-email", { token: second })).status).toBe(200);
    expect((await claimant.client.get(projectPath)).status).toBe(200);
  });

  it("keeps later invitations of an unverified address closed too, but not the user's own projects", async () => {
    const { email } = await invitedProject();
    const claimant = await t.signUp("Later", email);
    const other = await t.signUp("Other Owner");
    const { project } = (await other.client.post("/api/projects", { name: "Second invitation" })).body;
    await other.client.post(`/api/projects/${project.id}/members`, { email, role: "owner" });
    expect((await claimant.client.get(`/api/projects/${project.id}`)).status).toBe(404);
    // an owner membership that does not count opens no outbox either
    expect((await claimant.client.get("/api/outbox")).status).toBe(403);

    const own = await claimant.client.post("/api/projects", { name: "My own" });
    expect(own.status).toBe(201);
    expect((await claimant.client.get(`/api/projects/${own.body.project.id}`)).status).toBe(200);
  });

  it("needs a session to ask for a new link", async () => {
    const res = await t.client().post("/api/auth/verify-email/resend");
    expect([res.status, res.body.error.code]).toEqual([401, "unauthenticated"]);
  });
});

describe("signing up with a new e-mail", () => {
  it("is verified at once and is sent no mail, also when asking for one", async () => {
    const email = uniqueEmail("fresh");
    const { client } = await t.signUp("Fresh", email);
    expect((await client.get("/api/me")).body.user).toMatchObject({ email, emailVerified: true });
    expect((await client.post("/api/auth/verify-email/resend")).status).toBe(204);
    expect(await mailsTo(email)).toEqual([]);
    const { project } = (await client.post("/api/projects", { name: "Fresh project" })).body;
    expect((await client.get(`/api/projects/${project.id}`)).status).toBe(200);
  });

  it("signs in an existing verified user as before", async () => {
    const { email } = await t.signUp("Returning");
    const res = await t.client().post("/api/auth/sign-in", { email, password: testPassword });
    expect([res.status, res.body.user.emailVerified]).toEqual([200, true]);
  });
});

describe("rate limit", () => {
  it("limits requests for new links like sign-in (one budget per address)", async () => {
    const limited = await createTestApp({ env: { AUTH_RATE_LIMIT: "3" } });
    try {
      // the owner and the invitation through the services, so only the claimant's requests count
      const { user: owner } = await limited.services.auth.signUp({ email: uniqueEmail("limit.owner"), name: "Limit Owner", password: testPassword });
      const project = await limited.services.projects.create(owner.id, { name: "Limits", unitSystem: "si", compareThresholdPercent: 5 });
      const email = uniqueEmail("limited");
      await limited.services.members.invite(owner.id, project.id, { email, role: "viewer" });
      const claimant = await limited.signUp("Limited", email); // attempt 1
      const statuses: number[] = [];
      for (let i = 0; i < 3; i++) statuses.push((await claimant.client.post("/api/auth/verify-email/resend")).status);
      expect(statuses).toEqual([204, 204, 429]);
    } finally {
      await limited.close();
    }
  });
});
