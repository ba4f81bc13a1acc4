import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiLimits, errorBodySchema, errorStatus } from "@spanwright/contracts";
import { createTestApp, testPassword, twoSpanModel, uniqueEmail, type TestApp } from "@spanwright/api/testing";
import { hostileCredentialsBody, hostileSaveBody, hostileSolveBody, type HostileBody } from "./hostileBodies.js";
import { sessionCookieOf, startLiveServer, type LiveServer, type RawResponse } from "./liveServer.js";

/**
 * Hostile bodies against the routes that take user data: at least 10,000 in all. Every answer must
 * be a client error with the one error body (a rare valid body may succeed), never a 5xx, never a
 * stack trace, and never later than the per-request deadline.
 */
const runs = { solve: 4_000, save: 3_000, signUp: 1_500, signIn: 1_500 };
/** Requests in flight at once: overlaps database round trips; a batch shrinks like any array. */
const BATCH = 10;
const batchOf = <T>(arb: fc.Arbitrary<T>) => fc.array(arb, { minLength: BATCH, maxLength: BATCH });

let t: TestApp;
let server: LiveServer;
let cookie: string;
let save: { path: string; version: number };
const tally = new Map<number, number>();
let sent = 0;

beforeAll(async () => {
  t = await createTestApp();
  server = await startLiveServer(t.app);
  const up = await server.send({ method: "POST", path: "/api/auth/sign-up", body: JSON.stringify({ email: uniqueEmail("fuzz"), name: "Fuzz", password: testPassword }) });
  cookie = sessionCookieOf(up, t.config.sessionCookieName);
  const userId = (up.json as { user: { id: string } }).user.id;
  const project = await t.services.projects.create(userId, { name: "Fuzz", unitSystem: "si", compareThresholdPercent: 5 });
  const { beam } = await t.services.beams.create(userId, project.id, { name: "Fuzzed", model: twoSpanModel(), changeSummary: "" });
  save = { path: `/api/projects/${project.id}/beams/${beam.id}/revisions`, version: 1 };
});

afterAll(async () => {
  console.info(`fuzz: ${sent} hostile requests, answers by status: ${JSON.stringify(Object.fromEntries([...tally].sort()))}`);
  await server?.close();
  await t?.close();
});

function describeBody(body: HostileBody): string {
  return `${body.contentType} ${body.text.length} chars: ${body.text.slice(0, 200)}`;
}

/** The contract of an answer to a hostile body. */
function expectClientAnswer(res: RawResponse, body: HostileBody): void {
  sent++;
  tally.set(res.status, (tally.get(res.status) ?? 0) + 1);
  const context = `${res.status} ${res.text.slice(0, 300)} for ${describeBody(body)}`;
  expect(res.status, context).toBeLessThan(500);
  expect(res.text, context).not.toMatch(/\bat .+\.(ts|js|mjs):\d+|node_modules|Error:/);
  if (res.status < 400) return;
  const parsed = errorBodySchema.safeParse(res.json);
  expect(parsed.success, context).toBe(true);
  const code = parsed.data!.error.code;
  expect(res.status, context).toBe(code === "too-large" && res.status === 413 ? 413 : errorStatus[code]);
}

async function post(path: string, body: HostileBody, withSession: boolean): Promise<RawResponse> {
  return server.send({ method: "POST", path, body: body.text, contentType: body.contentType, cookie: withSession ? cookie : undefined });
}

/** Enough for the slowest legitimate answer on a busy 2-core machine; most take milliseconds. */
const TIMEOUT = 150_000;

describe("hostile bodies", () => {
  it(`POST /api/solve answers ${runs.solve} hostile models with 4xx and the error body`, async () => {
    await fc.assert(
      fc.asyncProperty(batchOf(hostileSolveBody), async (bodies) => {
        const answers = await Promise.all(bodies.map((body) => post("/api/solve", body, true)));
        answers.forEach((res, i) => expectClientAnswer(res, bodies[i]!));
      }),
      { numRuns: runs.solve / BATCH },
    );
  }, TIMEOUT);

  it(`saving a revision answers ${runs.save} hostile bodies with 4xx and the error body`, async () => {
    await fc.assert(
      fc.asyncProperty(batchOf(hostileSaveBody(() => save.version)), async (bodies) => {
        const answers = await Promise.all(bodies.map((body) => post(save.path, body, true)));
        answers.forEach((res, i) => {
          expectClientAnswer(res, bodies[i]!);
          if (res.status === 201) save.version = Math.max(save.version, (res.json as { revision: { version: number } }).revision.version);
        });
      }),
      { numRuns: runs.save / BATCH },
    );
  }, TIMEOUT);

  it.each([
    ["sign-up", "/api/auth/sign-up", runs.signUp],
    ["sign-in", "/api/auth/sign-in", runs.signIn],
  ])(`%s answers hostile credentials with 4xx and the error body`, async (_name, path, numRuns) => {
    await fc.assert(
      fc.asyncProperty(batchOf(hostileCredentialsBody), async (bodies) => {
        const answers = await Promise.all(bodies.map((body) => post(path, body, false)));
        answers.forEach((res, i) => expectClientAnswer(res, bodies[i]!));
      }),
      { numRuns: numRuns / BATCH },
    );
  }, TIMEOUT);

  it("ran at least 10,000 hostile requests", () => {
    expect(runs.solve + runs.save + runs.signUp + runs.signIn).toBeGreaterThanOrEqual(10_000);
    expect(sent).toBeGreaterThanOrEqual(10_000);
    // the bodies are hostile: nearly every one must have been refused
    const refused = [...tally].filter(([status]) => status >= 400).reduce((n, [, count]) => n + count, 0);
    expect(refused / sent).toBeGreaterThan(0.95);
  });
});

describe("size limits (apps/api/README.md: bodies up to 1 MB; models up to 1000 nodes, 50 load cases, 500 loads per case, 50 combinations)", () => {
  const tenMegabytes = "x".repeat(10 * 1024 * 1024);
  it.each([
    ["solve", () => "/api/solve", true],
    ["save revision", () => save.path, true],
    ["sign-up", () => "/api/auth/sign-up", false],
    ["sign-in", () => "/api/auth/sign-in", false],
  ])("answers a 10 MB body to %s with 413 too-large, promptly", async (_name, path, withSession) => {
    const body = { text: JSON.stringify({ baseVersion: 1, email: tenMegabytes, model: twoSpanModel() }), contentType: "application/json" };
    const started = Date.now();
    const res = await post(path(), body, withSession);
    expect(res.status).toBe(413);
    expect(res.json).toMatchObject({ error: { code: "too-large" } });
    expect(Date.now() - started).toBeLessThan(5_000);
  });

  it("answers a body just over 1 MB with 413 and one just under it normally", async () => {
    const padding = (bytes: number) => JSON.stringify({ ...twoSpanModel(), title: "" }).length - 2 + bytes;
    const over = JSON.stringify({ ...twoSpanModel(), title: "t".repeat(apiLimits.bodyBytes - padding(0) + 10) });
    const under = JSON.stringify({ ...twoSpanModel(), title: "t".repeat(apiLimits.bodyBytes - padding(0) - 10) });
    expect((await server.send({ method: "POST", path: "/api/solve", body: over, cookie })).status).toBe(413);
    expect((await server.send({ method: "POST", path: "/api/solve", body: under, cookie })).status).toBe(200);
  });

  it.each([
    ["nodes", (m: Record<string, unknown>) => ({ ...m, nodes: Array.from({ length: apiLimits.nodes + 1 }, (_, i) => ({ x: i, support: { type: "pinned" } })) })],
    ["loadCases", (m: Record<string, unknown>) => ({ ...m, loadCases: Array.from({ length: apiLimits.loadCases + 1 }, (_, i) => ({ id: `C${i}`, category: "dead", loads: [] })) })],
    ["loadCases[0].loads", (m: Record<string, unknown>) => ({ ...m, loadCases: [{ id: "D", category: "dead", loads: Array.from({ length: apiLimits.loadsPerCase + 1 }, () => ({ type: "point", x: 1, fy: -1 })) }] })],
    ["combinations", (m: Record<string, unknown>) => ({ ...m, combinations: Array.from({ length: apiLimits.combinations + 1 }, (_, i) => ({ id: `K${i}`, factors: { D: 1 } })) })],
  ])("refuses a model over the %s limit with 422 too-large on solve and save", async (where, grow) => {
    const model = grow(twoSpanModel());
    const solved = await server.send({ method: "POST", path: "/api/solve", body: JSON.stringify(model), cookie });
    expect(solved.status).toBe(422);
    expect(solved.json).toMatchObject({ error: { code: "too-large", details: { where } } });
    const saved = await server.send({ method: "POST", path: save.path, body: JSON.stringify({ baseVersion: save.version, model }), cookie });
    expect(saved.status).toBe(422);
    expect(saved.json).toMatchObject({ error: { code: "too-large", details: { where } } });
  });
});
