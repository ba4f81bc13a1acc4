import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, testPassword, type TestApp } from "@spanwright/api/testing";

/**
 * Session lifecycle as an attacker who copied a cookie would see it: the copy must stop working
 * when the user signs in again, signs out, or changes the password. (apps/api/src/auth/auth.test.ts
 * covers the happy paths; these replay the old token on a separate client.)
 */
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ env: { TRUST_PROXY: "loopback" } });
});
afterAll(() => t.close());

type Res = { headers: Record<string, unknown>; status: number };
const cookieName = () => t.config.sessionCookieName;

function setCookie(res: Res): string {
  const list = (res.headers["set-cookie"] as string[] | undefined) ?? [];
  const found = list.find((c) => c.startsWith(`${cookieName()}=`));
  if (!found) throw new Error(`no session cookie in a ${res.status} answer`);
  return found;
}
const pair = (cookie: string) => cookie.split(";")[0]!;

/** Presents a copied cookie from a fresh client, as a thief would. */
async function replay(cookie: string): Promise<number> {
  return (await t.client().agent.get("/api/me").set("Cookie", pair(cookie))).status;
}

describe("session tokens", () => {
  it("sign-in issues a new token, and the token presented before it stops working", async () => {
    const { client, email } = await t.signUp("Rotation");
    const before = setCookie(await client.post("/api/auth/sign-in", { email, password: testPassword }));
    expect(await replay(before)).toBe(200);
    const after = setCookie(await client.post("/api/auth/sign-in", { email, password: testPassword }));
    expect(pair(after)).not.toBe(pair(before));
    expect(await replay(before)).toBe(401);
    expect(await replay(after)).toBe(200);
  });

  it("sign-out ends the session on the server, not only in the browser", async () => {
    const { client, email } = await t.signUp("Leaver");
    const cookie = setCookie(await client.post("/api/auth/sign-in", { email, password: testPassword }));
    const out = await client.post("/api/auth/sign-out");
    expect(out.status).toBe(204);
    expect(setCookie(out)).toMatch(/Expires=Thu, 01 Jan 1970/i);
    expect(await replay(cookie)).toBe(401);
  });

  it("a password change ends every other session, and a copy of the current one keeps only its own", async () => {
    const { client, email } = await t.signUp("Changer");
    const current = setCookie(await client.post("/api/auth/sign-in", { email, password: testPassword }));
    const laptop = t.client();
    const other = setCookie(await laptop.post("/api/auth/sign-in", { email, password: testPassword }));
    const res = await client.post("/api/me/password", { currentPassword: testPassword, newPassword: "an entirely new passphrase" });
    expect(res.status).toBe(204);
    expect(await replay(other)).toBe(401);
    expect(await replay(current)).toBe(200);
    expect((await t.client().post("/api/auth/sign-in", { email, password: testPassword })).status).toBe(401);
  });

  it("a forged or malformed token is treated as no session", async () => {
    for (const token of ["A".repeat(32), "", "%00", "x".repeat(500), "' OR 1=1 --"]) {
      const res = await t.client().agent.get("/api/me").set("Cookie", `${cookieName()}=${encodeURIComponent(token)}`);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe("unauthenticated");
    }
  });
});

describe("session cookie attributes", () => {
  it("is HttpOnly, SameSite=Lax, path / and has an expiry, on sign-up and sign-in", async () => {
    const { email } = await t.signUp("Attributes");
    const signIn = await t.client().post("/api/auth/sign-in", { email, password: testPassword });
    for (const cookie of [setCookie(signIn)]) {
      expect(cookie).toMatch(/;\s*HttpOnly/i);
      expect(cookie).toMatch(/;\s*SameSite=Lax/i);
      expect(cookie).toMatch(/;\s*Path=\//i);
      expect(cookie).toMatch(/;\s*Expires=/i);
      expect(cookie).not.toMatch(/;\s*Domain=/i);
    }
  });

  it("is Secure when the request came over https through a trusted proxy", async () => {
    const { email } = await t.signUp("Behind TLS");
    const res = await t.client().agent
      .post("/api/auth/sign-in")
      .set("Origin", "http://spanwright.test")
      .set("X-Forwarded-Proto", "https")
      .send({ email, password: testPassword });
    expect(res.status).toBe(200);
    expect(setCookie(res)).toMatch(/;\s*Secure/i);
  });
});
