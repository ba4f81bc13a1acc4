import { parentPort } from "node:worker_threads";
import { solve } from "@spanwright/solver";
import type { WorkerReady, WorkerReply, WorkerTask } from "./solverPool.js";

/**
 * One solver thread of the pool (solverPool.ts). Expected solver failures travel back as values:
 * an Error's own fields (`code`, `where`) do not survive the structured clone between threads.
 */
function answer(task: WorkerTask): WorkerReply {
  try {
    // a JSON string, not the object: the solve route sends it as it is, and a string crosses the
    // thread boundary far cheaper than a deep clone of thousands of station records
    const model = task.json !== undefined ? JSON.parse(task.json) : task.model;
    return { id: task.id, ok: true, json: JSON.stringify(solve(model)) };
  } catch (error) {
    const e = error as { name?: unknown; code?: unknown; message?: unknown; where?: unknown; stack?: unknown };
    return {
      id: task.id,
      ok: false,
      error: {
        name: typeof e?.name === "string" ? e.name : "Error",
        code: typeof e?.code === "string" ? e.code : null,
        message: typeof e?.message === "string" ? e.message : String(error),
        where: typeof e?.where === "string" ? e.where : null,
        stack: typeof e?.stack === "string" ? e.stack : null,
      },
    };
  }
}

/** Invented: a two-span beam, solved once so the first real request does not pay for compiling the engine. */
const warmUpModel = {
  format: "spanwright.beam/1",
  nodes: [{ x: 0, support: { type: "pinned" } }, { x: 5, support: { type: "roller" } }, { x: 10, support: { type: "roller" } }],
  segments: [{ E: 2e11, I: 1e-4 }, { E: 2e11, I: 1e-4 }],
  loadCases: [{ id: "Q", category: "live", pattern: true, loads: [{ type: "distributed", x1: 0, x2: 10, qy1: -1000, qy2: -1000 }] }],
  combinations: [{ id: "U", factors: { Q: 1.5 } }],
};
for (let i = 0; i < 20; i++) answer({ id: 0, model: warmUpModel });

parentPort?.on("message", (task: WorkerTask) => parentPort?.postMessage(answer(task)));
// the pool counts the deadline from dispatch, so it waits for this before sending work
parentPort?.postMessage({ ready: true } satisfies WorkerReady);
