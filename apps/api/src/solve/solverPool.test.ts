import { afterAll, describe, expect, it } from "vitest";
import { twoSpanModel } from "../testing/models.js";
import { createSolverPool } from "./solverPool.js";

/**
 * Invented: a 600-span beam with two patterned live cases and 1,200 combinations of them, about
 * 9 s of solver time on the shared 2-core machine (December 2026), far past the pool's 3 s deadline
 * and the API's work limit, which the pool does not check. The pattern envelope of each combination
 * is the slow part (about 1 s for the splits, then some 6 ms per combination); combinations add
 * time without the memory of more spans or patterned cases. Faster envelopes need more of them.
 */
function slowModel(): Record<string, unknown> {
  const spans = 600;
  return {
    format: "spanwright.beam/1",
    nodes: Array.from({ length: spans + 1 }, (_, i) => ({ x: i * 5, support: { type: "pinned" } })),
    segments: Array.from({ length: spans }, () => ({ E: 2e11, I: 2.5e-4 })),
    loadCases: ["Q1", "Q2"].map((id) => ({ id, category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: spans * 5, qy1: -5000, qy2: -5000 }] })),
    combinations: Array.from({ length: 1200 }, (_, i) => ({ id: `U${i}`, factors: { Q1: 1.2 + i * 0.0005, Q2: 1.6 - i * 0.0005 } })),
  };
}

const pool = createSolverPool({ threads: 2, timeoutMs: 3_000, maxQueue: 4 });
// threads start in the background; the first test waits for them
afterAll(() => pool.close());

describe("solver pool", () => {
  it("solves on a worker thread and answers the result as JSON text", async () => {
    const result = JSON.parse(await pool.solve(twoSpanModel()));
    expect(result.format).toBe("spanwright.result/1");
  }, 20_000);

  it("solves from the model's JSON text when given it (the solve route passes the request's body)", async () => {
    const model = twoSpanModel();
    const fromText = await pool.solve({ ignored: "the text is what the thread reads" }, { json: JSON.stringify(model) });
    expect(fromText).toBe(await pool.solve(model));
    const wrong = { ...model, segments: [{ E: 2e11, I: -1 }, { E: 2e11, I: 1e-4 }] };
    await expect(pool.solve(model, { json: JSON.stringify(wrong) })).rejects.toMatchObject({ code: "invalid-model", where: expect.stringContaining("segments") });
  });

  it("passes the solver's own errors back with code and where", async () => {
    const model = { ...twoSpanModel(), segments: [{ E: 2e11, I: -1 }, { E: 2e11, I: 1e-4 }] };
    await expect(pool.solve(model)).rejects.toMatchObject({ name: "SolverError", code: "invalid-model", where: expect.stringContaining("segments") });
  });

  it("stops a solve at the deadline with too-large, and keeps answering small models meanwhile", async () => {
    const started = Date.now();
    const slow = pool.solve(slowModel()).catch((error: unknown) => error);
    const small = await pool.solve(twoSpanModel());
    const smallAt = Date.now() - started;
    expect(await slow).toMatchObject({ name: "SolverError", code: "too-large" });
    const slowAt = Date.now() - started;
    expect(JSON.parse(small).format).toBe("spanwright.result/1");
    // queued behind the slow solve it would wait for the deadline (a busy shared machine is slow, not that slow)
    expect(smallAt).toBeLessThan(2_500);
    // the deadline plus the time to end the thread; the solve alone would take seconds
    expect(slowAt).toBeGreaterThanOrEqual(3_000);
    expect(slowAt).toBeLessThan(6_000);
    // the ended thread was replaced: both threads solve again
    const both = await Promise.all([pool.solve(twoSpanModel()), pool.solve(twoSpanModel())]);
    expect(both.map((json) => JSON.parse(json).format)).toEqual(["spanwright.result/1", "spanwright.result/1"]);
  }, 20_000);

  it("answers solver-busy at once when the queue is full", async () => {
    const running = [pool.solve(slowModel()), pool.solve(slowModel())];
    const queued = Array.from({ length: 4 }, () => pool.solve(twoSpanModel()));
    await expect(pool.solve(twoSpanModel())).rejects.toMatchObject({ code: "solver-busy", details: { retryAfterSeconds: 2 } });
    await Promise.allSettled([...running, ...queued]);
  }, 20_000);

  it("refuses a solve that waits for a thread longer than maxWaitMs with solver-busy", async () => {
    const single = createSolverPool({ threads: 1, timeoutMs: 3_000, maxWaitMs: 300 });
    try {
      // the thread takes seconds to start on a busy machine; until then short waits are refused too
      for (let tries = 0; ; tries++) {
        const first = await single.solve(twoSpanModel()).catch((error: unknown) => error);
        if (typeof first === "string") break;
        expect(first).toMatchObject({ code: "solver-busy" });
        expect(tries).toBeLessThan(100);
      }
      const slow = single.solve(slowModel()).catch((error: unknown) => error);
      const started = Date.now();
      await expect(single.solve(twoSpanModel())).rejects.toMatchObject({ code: "solver-busy" });
      expect(Date.now() - started).toBeLessThan(2_000);
      expect(await slow).toMatchObject({ code: "too-large" });
    } finally {
      await single.close();
    }
  }, 30_000);
});
