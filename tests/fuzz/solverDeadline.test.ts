import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiLimits } from "@spanwright/contracts";
import { createTestApp, testPassword, twoSpanModel, uniqueEmail, type TestApp } from "@spanwright/api/testing";
import { createSolverPool, type SolverPool } from "../../apps/api/src/solve/solverPool.js";
import { sessionCookieOf, startLiveServer, type LiveServer, type RawResponse } from "./liveServer.js";

/**
 * Models that once held the server for seconds (found by the hostile-body suite): the API refuses
 * them by its limits at once, a solve inside the limits that still runs long is stopped at the
 * deadline, and small requests keep being answered meanwhile. The server runs the solver on its
 * thread pool here, as in production, with a short deadline so the test stays quick.
 */
const DEADLINE_MS = 200;

let t: TestApp;
let pool: SolverPool;
let server: LiveServer;
let cookie: string;

beforeAll(async () => {
  // a long wait allowance: the threads take seconds to start on a busy machine
  pool = createSolverPool({ threads: 2, timeoutMs: DEADLINE_MS, maxWaitMs: 60_000 });
  t = await createTestApp({ engine: pool });
  server = await startLiveServer(t.app);
  const up = await server.send({ method: "POST", path: "/api/auth/sign-up", body: JSON.stringify({ email: uniqueEmail("deadline"), name: "Deadline", password: testPassword }) });
  cookie = sessionCookieOf(up, t.config.sessionCookieName);
  // the threads load and warm the engine in the background: wait for a first answer
  expect((await solve(twoSpanModel())).status).toBe(200);
}, 120_000);

afterAll(async () => {
  await server?.close();
  await t?.close();
  await pool?.close();
});

function solve(model: unknown): Promise<RawResponse> {
  return server.send({ method: "POST", path: "/api/solve", body: JSON.stringify(model), cookie });
}

/** Invented continuous beam on pinned supports, 5 m spans, steel section; gravity loads negative. */
function beam(spans: number, extra: { pointLoads?: number; patterned?: boolean; stations?: number } = {}): Record<string, unknown> {
  const length = spans * 5;
  const loadCases: unknown[] = [];
  if (extra.pointLoads) {
    loadCases.push({ id: "G", category: "dead", loads: Array.from({ length: extra.pointLoads }, (_, i) => ({ type: "point", x: ((i + 0.5) / extra.pointLoads!) * length, fy: -1000 })) });
  }
  if (extra.patterned) loadCases.push({ id: "Q", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: length, qy1: -5000, qy2: -5000 }] });
  return {
    format: "spanwright.beam/1",
    nodes: Array.from({ length: spans + 1 }, (_, i) => ({ x: i * 5, support: { type: "pinned" } })),
    segments: Array.from({ length: spans }, () => ({ E: 2e11, I: 2.5e-4 })),
    loadCases,
    // a combination has an envelope over the pattern arrangements: the slow part of a patterned case
    ...(extra.patterned ? { combinations: [{ id: "U", factors: { Q: 1.5 } }] } : {}),
    ...(extra.stations ? { stations: Array.from({ length: extra.stations }, (_, i) => (i / extra.stations!) * length) } : {}),
  };
}

/** Sends the big model and, while it is in flight, a small one; both answers and their times. */
async function alongsideSmall(big: unknown): Promise<{ big: RawResponse; bigMs: number; small: RawResponse; smallMs: number }> {
  const started = Date.now();
  const bigAnswer = solve(big).then((res) => ({ res, ms: Date.now() - started }));
  const small = await solve(twoSpanModel());
  const smallMs = Date.now() - started;
  const { res, ms } = await bigAnswer;
  return { big: res, bigMs: ms, small, smallMs };
}

describe("solver time within the documented limits", () => {
  it("refuses 100,000 output stations (once 3.4 s of solver time) at once, naming stations", async () => {
    const { big, bigMs, small, smallMs } = await alongsideSmall(beam(20, { patterned: true, stations: 100_000 }));
    expect(big.status).toBe(422);
    expect(big.json).toMatchObject({ error: { code: "too-large", details: { where: "stations", limit: apiLimits.stations } } });
    expect(bigMs).toBeLessThan(5_000);
    expect(small.status).toBe(200);
    expect(smallMs).toBeLessThan(5_000);
  });

  it("refuses 999 spans with 500 point loads and a patterned live case (once 28 s) at once, as too much work", async () => {
    const { big, bigMs, small } = await alongsideSmall(beam(999, { pointLoads: 500, patterned: true }));
    expect(big.status).toBe(422);
    expect(big.json).toMatchObject({ error: { code: "too-large", details: { limit: apiLimits.work } } });
    expect(bigMs).toBeLessThan(5_000);
    expect(small.status).toBe(200);
  });

  it("stops a solve inside the limits that outlasts the deadline with 422 too-large, answering a small request first", async () => {
    // 160 spans with a patterned case: within the work bound, about a second of solver time
    const { big, bigMs, small, smallMs } = await alongsideSmall(beam(160, { patterned: true }));
    expect(big.status).toBe(422);
    expect(big.json).toMatchObject({ error: { code: "too-large" } });
    expect(bigMs).toBeGreaterThanOrEqual(DEADLINE_MS);
    expect(bigMs).toBeLessThan(DEADLINE_MS + 3_000);
    expect(small.status).toBe(200);
    expect(smallMs).toBeLessThan(bigMs);
  }, 30_000);
});
