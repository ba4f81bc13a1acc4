import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, uniqueEmail, type TestApp } from "@spanwright/api/testing";

/** helmet's headers on API answers, error answers and the web app; the sign-in rate limit at its default. */
let t: TestApp;
beforeAll(async () => {
  // AUTH_RATE_LIMIT unset (undefined overrides the harness's high test limit): the shipped default applies
  t = await createTestApp({ env: { SERVE_WEB: "true", AUTH_RATE_LIMIT: undefined as unknown as string } });
});
afterAll(() => t.close());

const expectedHeaders: Record<string, RegExp> = {
  "content-security-policy": /default-src 'self'.*frame-ancestors 'self'.*object-src 'none'/,
  "x-content-type-options": /^nosniff$/,
  "x-frame-options": /^SAMEORIGIN$/,
  "referrer-policy": /^no-referrer$/,
  "cross-origin-opener-policy": /^same-origin$/,
  "cross-origin-resource-policy": /^same-origin$/,
  "strict-transport-security": /max-age=\d+/,
  "x-dns-prefetch-control": /^off$/,
  "x-permitted-cross-domain-policies": /^none$/,
};

describe("security headers", () => {
  it.each([
    ["a JSON answer", "/api/health"],
    ["an error answer", "/api/me"],
    ["an unknown API path", "/api/nothing-here"],
    ["the web app", "/"],
  ])("are on %s", async (_label, url) => {
    const res = await t.client().get(url);
    for (const [name, pattern] of Object.entries(expectedHeaders)) expect([name, res.headers[name]]).toEqual([name, expect.stringMatching(pattern)]);
    expect(res.headers["x-powered-by"]).toBeUndefined();
    expect(res.headers["content-security-policy"]).not.toMatch(/upgrade-insecure-requests/);
    expect(res.headers["x-request-id"]).toMatch(/^[\w-]+$/);
  });

  it.each(["<script>alert(1)</script>", "a b", "x".repeat(65), "id;Set-Cookie=x"])("do not echo a client's request id %s", async (id) => {
    const res = await t.client().agent.get("/api/health").set("X-Request-Id", id);
    expect(res.headers["x-request-id"]).toMatch(/^[0-9a-f-]{36}$/);
  });
});

describe("sign-in rate limit at its default", () => {
  it("answers 429 rate-limited after 20 attempts from one address, with RateLimit headers", async () => {
    expect(t.config.authRateLimit).toBe(20);
    const c = t.client();
    const body = { email: uniqueEmail("guesser"), password: "not the password" };
    const statuses: number[] = [];
    for (let i = 0; i < 21; i++) statuses.push((await c.post("/api/auth/sign-in", body)).status);
    expect(statuses.slice(0, 20).every((s) => s === 401)).toBe(true);
    const limited = await c.post("/api/auth/sign-in", body);
    expect(statuses[20]).toBe(429);
    expect(limited.body.error.code).toBe("rate-limited");
    expect(limited.headers.ratelimit ?? limited.headers["ratelimit-policy"]).toBeDefined();
    // sign-up shares the budget, so switching route does not reset the count
    expect((await c.post("/api/auth/sign-up", { ...body, name: "Guess" })).status).toBe(429);
  });
});
