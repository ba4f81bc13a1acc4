import os from "node:os";
import { Worker } from "node:worker_threads";
import { AppError } from "../http/appError.js";
import type { Engine } from "./engine.js";
import { solverWorkerSource } from "./solverWorkerBundle.js";

/** What the pool posts to a solver thread (solveWorker.ts). */
export interface WorkerTask {
  id: number;
  /** The model, or with `json` undefined (the thread parses the text). */
  model: unknown;
  json?: string;
}

/** What a solver thread posts once it has loaded and warmed up the engine. */
export interface WorkerReady {
  ready: true;
}

/** What a solver thread posts back: the result as JSON text, or the thrown error's fields. */
export type WorkerReply =
  | { id: number; ok: true; json: string }
  | {
      id: number;
      ok: false;
      error: { name: string; code: string | null; message: string; where: string | null; stack: string | null };
    };

export interface SolverPoolOptions {
  /** Solver threads; default: the cores available to this process less one, at least one. */
  threads?: number;
  /** Longest a solve may run once started; past it the thread is ended and replaced (422 `too-large`). */
  timeoutMs: number;
  /** Solves waiting for a thread; more: 503 `solver-busy`. Default 64 per thread. */
  maxQueue?: number;
  /** Longest a solve may wait for a thread, then 503 `solver-busy`; default twice `timeoutMs`. */
  maxWaitMs?: number;
}

/** The solver on worker threads: engine plus close(), which ends every thread. */
export interface SolverPool extends Engine {
  close(): Promise<void>;
  readonly threads: number;
}

interface Job {
  id: number;
  model: unknown;
  json: string | undefined;
  /** Ends the wait for a thread; cleared once a thread takes the job. */
  waitTimer: NodeJS.Timeout | null;
  resolve: (json: string) => void;
  reject: (error: unknown) => void;
}

interface Slot {
  worker: Worker;
  ready: boolean;
  job: Job | null;
  timer: NodeJS.Timeout | null;
}

/**
 * A full result is ~10 MB of short-lived row objects; with V8's default young generation they are
 * copied and promoted mid-solve, which cost more than the solve. 64 MB semi-spaces (192 MB young
 * generation per thread) keep a result in the nursery until it is sent.
 */
const YOUNG_GENERATION_MB = 192;

function solverFailure(reply: Extract<WorkerReply, { ok: false }>["error"]): Error {
  const error = Object.assign(new Error(reply.message), reply.code ? { code: reply.code } : {}, reply.where !== null ? { where: reply.where } : {});
  error.name = reply.name;
  if (reply.stack) error.stack = reply.stack;
  return error;
}

/**
 * A small pool of solver threads so a long solve never blocks the event loop, with a deadline per
 * solve: a thread past it is terminated (the only way to stop synchronous code) and replaced.
 */
export function createSolverPool(options: SolverPoolOptions): SolverPool {
  // one core is left to the event loop (HTTP, database, JSON): on the 2-core machine two solver
  // threads beside it made the load test slower and its latency tail longer than one
  const threads = Math.max(1, options.threads ?? os.availableParallelism() - 1);
  const maxQueue = options.maxQueue ?? 64 * threads;
  const maxWaitMs = options.maxWaitMs ?? 2 * options.timeoutMs;
  const busy = () => new AppError("solver-busy", "the solver is busy; try again in a few seconds", { retryAfterSeconds: 2 });
  const queue: Job[] = [];
  const slots: Slot[] = [];
  let nextId = 1;
  let closed = false;

  function spawn(): Slot {
    const worker = new Worker(solverWorkerSource(), { eval: true, execArgv: [], resourceLimits: { maxYoungGenerationSizeMb: YOUNG_GENERATION_MB } });
    const slot: Slot = { worker, ready: false, job: null, timer: null };
    worker.on("message", (reply: WorkerReply | WorkerReady) => {
      if ("ready" in reply) {
        slot.ready = true;
        return dispatch();
      }
      const job = slot.job;
      if (!job || job.id !== reply.id) return;
      finish(slot);
      if (reply.ok) job.resolve(reply.json);
      else job.reject(solverFailure(reply.error));
      dispatch();
    });
    // a crashed thread (out of memory, a bug in the worker) fails its job and is replaced
    worker.on("error", (error) => replace(slot, error));
    worker.on("exit", (code) => {
      if (!closed && slots.includes(slot)) replace(slot, new Error(`solver thread exited with code ${code}`));
    });
    worker.unref();
    return slot;
  }

  function finish(slot: Slot): void {
    if (slot.timer) clearTimeout(slot.timer);
    slot.timer = null;
    slot.job = null;
  }

  function replace(slot: Slot, error: unknown): void {
    const job = slot.job;
    finish(slot);
    const index = slots.indexOf(slot);
    if (index < 0) return;
    slots.splice(index, 1);
    void slot.worker.terminate();
    job?.reject(error);
    if (closed) return;
    if (slot.ready) {
      slots.push(spawn());
      return dispatch();
    }
    // a thread that cannot even start (a broken install): fail the waiting solves rather than hang
    // them, and try again a second later instead of spinning
    for (const waiting of queue.splice(0)) {
      if (waiting.waitTimer) clearTimeout(waiting.waitTimer);
      waiting.reject(error);
    }
    setTimeout(() => {
      if (!closed) slots.push(spawn());
    }, 1000).unref();
  }

  function dispatch(): void {
    for (const slot of slots) {
      if (!slot.ready || slot.job) continue;
      const job = queue.shift();
      if (!job) return;
      if (job.waitTimer) clearTimeout(job.waitTimer);
      slot.job = job;
      slot.timer = setTimeout(() => {
        const seconds = options.timeoutMs / 1000;
        replace(slot, Object.assign(new Error(`the model takes longer than ${seconds} s to solve; reduce spans, loads, patterned cases or stations`), {
          name: "SolverError",
          code: "too-large",
          where: "",
        }));
      }, options.timeoutMs);
      const task: WorkerTask = job.json !== undefined ? { id: job.id, model: undefined, json: job.json } : { id: job.id, model: job.model };
      slot.worker.postMessage(task);
    }
  }

  for (let i = 0; i < threads; i++) slots.push(spawn());

  return {
    threads,
    solve(model, solveOptions) {
      if (closed) return Promise.reject(new Error("the solver pool is closed"));
      if (queue.length >= maxQueue) return Promise.reject(busy());
      return new Promise<string>((resolve, reject) => {
        const job: Job = { id: nextId++, model, json: solveOptions?.json, waitTimer: null, resolve, reject };
        // never a hung request: a solve that cannot get a thread in time is refused, not kept waiting
        job.waitTimer = setTimeout(() => {
          const index = queue.indexOf(job);
          if (index < 0) return;
          queue.splice(index, 1);
          reject(busy());
        }, maxWaitMs);
        queue.push(job);
        dispatch();
      });
    },
    async close() {
      closed = true;
      for (const job of queue.splice(0)) {
        if (job.waitTimer) clearTimeout(job.waitTimer);
        job.reject(new Error("the solver pool is closed"));
      }
      await Promise.all(slots.splice(0).map((slot) => {
        slot.job?.reject(new Error("the solver pool is closed"));
        finish(slot);
        return slot.worker.terminate();
      }));
    },
  };
}
