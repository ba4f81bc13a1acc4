import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, testPassword, uniqueEmail, type TestApp } from "../testing/index.js";
import { sessionIdFromToken, sessionLifetimeMs, sessionRenewWithinMs } from "./sessionToken.js";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const cookieName = () => t.config.sessionCookieName;
function sessionCookie(res: { headers: Record<string, unknown> }): string | undefined {
  const raw = res.headers["set-cookie"];
  const list = Array.isArray(raw) ? (raw as string[]) : [];
  return list.find((c) => c.startsWith(`${cookieName()}=`));
}

describe("sign-up, sign-in, sign-out", () => {
  it("signs up, is signed in, signs out and is then anonymous", async () => {
    const c = t.client();
    const email = uniqueEmail("Ada");
    const up = await c.post("/api/auth/sign-up", { email, name: "Ada Okafor", password: testPassword });
    expect(up.status).toBe(201);
    expect(up.body.user).toMatchObject({ email, name: "Ada Okafor" });
    expect(up.body.user).not.toHaveProperty("passwordHash");
    const cookie = sessionCookie(up)!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i); // plain http in tests

    expect((await c.get("/api/me")).body.user.email).toBe(email);
    expect((await c.post("/api/auth/sign-out")).status).toBe(204);
    const after = await c.get("/api/me");
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe("unauthenticated");
  });

  it("stores only the hash of the session token", async () => {
    const c = t.client();
    const up = await c.post("/api/auth/sign-up", { email: uniqueEmail("h"), name: "H", password: testPassword });
    const token = sessionCookie(up)!.split(";")[0]!.split("=")[1]!;
    const { sessions } = await import("../db/schema.js");
    const rows = await t.database.db.select({ id: sessions.id }).from(sessions);
    const ids = rows.map((r) => r.id);
    expect(ids).toContain(sessionIdFromToken(token));
    expect(ids).not.toContain(token);
  });

  it("refuses a second account with the same e-mail, whatever its case", async () => {
    const email = uniqueEmail("dup");
    await t.signUp("Dup", email);
    const res = await t.client().post("/api/auth/sign-up", { email: email.toUpperCase(), name: "Dup", password: testPassword });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("email-taken");
  });

  it("signs in with the right password and rotates the session", async () => {
    const { client, email } = await t.signUp("Rotor");
    const first = await client.post("/api/auth/sign-in", { email, password: testPassword });
    expect(first.status).toBe(200);
    const second = await client.post("/api/auth/sign-in", { email, password: testPassword });
    expect(sessionCookie(first)).not.toEqual(sessionCookie(second));
    const stale = t.client();
    const oldToken = sessionCookie(first)!.split(";")[0]!;
    const res = await stale.agent.get("/api/me").set("Cookie", oldToken);
    expect(res.status).toBe(401);
  });

  it.each([
    ["a wrong password", (email: string) => ({ email, password: "wrong password here" })],
    ["an unknown e-mail", () => ({ email: uniqueEmail("nobody"), password: testPassword })],
  ])("answers %s with the same 401", async (_label, body) => {
    const { email } = await t.signUp("Victim");
    const res = await t.client().post("/api/auth/sign-in", body(email));
    expect(res.status).toBe(401);
    expect(res.body.error).toEqual({ code: "invalid-credentials", message: "wrong e-mail or password" });
  });

  it("names the bad fields of a malformed sign-up", async () => {
    const res = await t.client().post("/api/auth/sign-up", { email: "not-an-email", name: "", password: "short" });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid-request");
    const paths = (res.body.error.details.issues as Array<{ path: string }>).map((i) => i.path).sort();
    expect(paths).toEqual(["email", "name", "password"]);
  });

  it("answers a body that is not JSON with 400", async () => {
    const res = await t.client().agent
      .post("/api/auth/sign-in")
      .set("Origin", "http://spanwright.test")
      .set("Content-Type", "application/json")
      .send("{ not json");
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("invalid-request");
  });
});

describe("session lifetime", () => {
  it("expires a session after 30 days without use", async () => {
    const { client } = await t.signUp("Sleeper");
    t.clock.advance(sessionLifetimeMs + 1000);
    try {
      expect((await client.get("/api/me")).status).toBe(401);
    } finally {
      t.clock.advance(-(sessionLifetimeMs + 1000));
    }
    // the expired session was deleted, so going back in time does not revive it
    expect((await client.get("/api/me")).status).toBe(401);
  });

  it("sweeps sessions that expired and were never presented again, keeping live ones", async () => {
    const { sessions } = await import("../db/schema.js");
    const countSessions = async () => (await t.database.db.select({ id: sessions.id }).from(sessions)).length;
    await t.signUp("Gone Away");
    const before = await countSessions();
    t.clock.advance(sessionLifetimeMs + 1000);
    let swept: number;
    try {
      const { client } = await t.signUp("Still Here");
      swept = await t.services.auth.sweepExpiredSessions();
      expect((await client.get("/api/me")).status).toBe(200);
    } finally {
      t.clock.advance(-(sessionLifetimeMs + 1000));
    }
    // every session made before the jump expired (this file's earlier ones too); the new one stays
    expect(swept).toBe(before);
    expect(await countSessions()).toBe(1);
  });

  it("slides the expiry forward when less than half the lifetime is left", async () => {
    const { client } = await t.signUp("Regular");
    const shift = sessionLifetimeMs - sessionRenewWithinMs + 60_000;
    t.clock.advance(shift);
    try {
      const res = await client.get("/api/me");
      expect(res.status).toBe(200);
      const renewed = sessionCookie(res);
      expect(renewed).toBeDefined();
      const expires = new Date(/Expires=([^;]+)/i.exec(renewed!)![1]!).getTime();
      expect(expires).toBeGreaterThan(Date.now() + shift + sessionLifetimeMs - 5000);
    } finally {
      t.clock.advance(-shift);
    }
  });
});

describe("password change", () => {
  it("needs the current password and ends the user's other sessions", async () => {
    const { client, email } = await t.signUp("Changer");
    const other = t.client();
    expect((await other.post("/api/auth/sign-in", { email, password: testPassword })).status).toBe(200);

    const wrong = await client.post("/api/me/password", { currentPassword: "nope nope nope", newPassword: "a brand new passphrase" });
    expect(wrong.status).toBe(401);

    const ok = await client.post("/api/me/password", { currentPassword: testPassword, newPassword: "a brand new passphrase" });
    expect(ok.status).toBe(204);
    expect((await client.get("/api/me")).status).toBe(200);
    expect((await other.get("/api/me")).status).toBe(401);
    const again = await t.client().post("/api/auth/sign-in", { email, password: "a brand new passphrase" });
    expect(again.status).toBe(200);
  });
});

describe("CSRF", () => {
  it("refuses a state-changing request from another origin with 403 csrf", async () => {
    const { client } = await t.signUp("Target");
    const res = await client.agent.post("/api/projects").set("Origin", "https://evil.example").send({ name: "Pwned" });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("csrf");
    expect((await client.get("/api/projects")).body.projects).toEqual([]);
  });

  it("refuses a cookie-carrying request without Origin", async () => {
    const { client } = await t.signUp("NoOrigin");
    const res = await client.agent.post("/api/projects").send({ name: "x" });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("csrf");
  });

  it("accepts the request when Origin matches the Host", async () => {
    const { client } = await t.signUp("SameSite");
    const res = await client.agent
      .post("/api/projects")
      .set("Host", "spanwright.example:8080")
      .set("Origin", "http://spanwright.example:8080")
      .send({ name: "Same origin" });
    expect(res.status).toBe(201);
  });
});

describe("rate limit", () => {
  it("answers 429 after too many sign-in attempts", async () => {
    const limited = await createTestApp({ env: { AUTH_RATE_LIMIT: "3" } });
    try {
      const c = limited.client();
      const body = { email: uniqueEmail("brute"), password: "guess guess guess" };
      const statuses: number[] = [];
      for (let i = 0; i < 5; i++) statuses.push((await c.post("/api/auth/sign-in", body)).status);
      expect(statuses).toEqual([401, 401, 401, 429, 429]);
      const res = await c.post("/api/auth/sign-in", body);
      expect(res.body.error.code).toBe("rate-limited");
    } finally {
      await limited.close();
    }
  });
});
