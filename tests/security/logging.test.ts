import { pino } from "pino";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createApp } from "@spanwright/api";
import { Client, createTestApp, twoSpanModel, uniqueEmail, type TestApp } from "@spanwright/api/testing";

/**
 * What the server writes to its log: every line, at the most verbose level, captured in memory.
 * Passwords and session tokens never appear; each request's lines carry its request id; an
 * unexpected failure is logged once, with its stack and the request's context, and the client
 * sees neither.
 */
interface LogLine {
  level: number;
  msg?: string;
  reqId?: string;
  req?: { id?: string; method?: string; url?: string };
  res?: { statusCode?: number };
  err?: { type?: string; message?: string; stack?: string };
}

let t: TestApp;
let client: () => Client;
const raw: string[] = [];
const lines = (): LogLine[] => raw.map((l) => JSON.parse(l) as LogLine);

beforeAll(async () => {
  t = await createTestApp();
  const logger = pino({ level: "trace" }, { write: (line: string) => void raw.push(line) });
  const engine = {
    solve: (): never => {
      throw new TypeError("internal detail at engine.ts:42");
    },
  };
  const { app } = createApp({ config: { ...t.config, logLevel: "trace" }, database: t.database, engine, logger });
  client = () => new Client(app);
});
afterAll(() => t.close());

const linesOf = (requestId: string) => lines().filter((l) => l.req?.id === requestId || l.reqId === requestId);

describe("the server log", () => {
  it("never holds a password or session token, through sign-up, sign-in, a failed sign-in and a password change", async () => {
    const email = uniqueEmail("logged");
    const first = "first passphrase 7f3a9c";
    const second = "second passphrase 2b8e1d";
    const wrong = "wrong passphrase 5c6d0e";
    const c = client();
    const up = await c.post("/api/auth/sign-up", { email, name: "Logged", password: first });
    expect(up.status).toBe(201);
    expect((await client().post("/api/auth/sign-in", { email, password: wrong })).status).toBe(401);
    const signIn = await c.post("/api/auth/sign-in", { email, password: first });
    expect(signIn.status).toBe(200);
    expect((await c.post("/api/me/password", { currentPassword: first, newPassword: second })).status).toBe(204);
    expect((await c.post("/api/auth/sign-up", { email: "not an e-mail", name: "X", password: first })).status).toBe(400);

    const tokens = [up, signIn].map((r) => (r.headers["set-cookie"] as unknown as string[])[0]!.split(";")[0]!.split("=")[1]!);
    const log = raw.join("");
    expect(raw.length).toBeGreaterThanOrEqual(5);
    for (const secret of [first, second, wrong, ...tokens]) expect(log).not.toContain(secret);
    expect(log).not.toMatch(/cookie|authorization/i);
  });

  it("tags each request's lines with the request id it answered with", async () => {
    const res = await client().get("/api/health");
    const id = res.headers["x-request-id"] as string;
    const mine = linesOf(id);
    expect(mine.length).toBeGreaterThanOrEqual(1);
    expect(mine.at(-1)).toMatchObject({ req: { method: "GET", url: "/api/health" }, res: { statusCode: 200 } });
  });

  it("logs an unexpected failure once at error level, with stack and request context, and sends none of it", async () => {
    const { client: signedIn } = await signUpOn(client());
    raw.length = 0;
    const res = await signedIn.post("/api/solve", twoSpanModel());
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: { code: "internal", message: "something went wrong on the server" } });
    expect(res.text).not.toMatch(/engine\.ts|TypeError|internal detail|\bat /);

    const id = res.headers["x-request-id"] as string;
    const errors = lines().filter((l) => l.level >= 50 && l.err);
    expect(errors).toHaveLength(1);
    expect(errors[0]!.err).toMatchObject({ type: "TypeError", message: "internal detail at engine.ts:42" });
    expect(errors[0]!.err!.stack).toMatch(/TypeError/);
    expect(errors[0]!.req?.id ?? errors[0]!.reqId).toBe(id);
    expect(errors[0]!.req).toMatchObject({ method: "POST", url: "/api/solve" });
  });

  it("does not log expected client errors (4xx) as server errors", async () => {
    raw.length = 0;
    await client().get("/api/me");
    await client().post("/api/auth/sign-in", { email: "x" });
    expect(lines().filter((l) => l.level >= 50)).toEqual([]);
  });
});

async function signUpOn(c: Client) {
  const res = await c.post("/api/auth/sign-up", { email: uniqueEmail("err"), name: "Err", password: "a long enough passphrase" });
  expect(res.status).toBe(201);
  return { client: c };
}
