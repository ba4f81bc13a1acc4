import type { SolveResponse } from "./solveMessages";

// One engine worker for the app, started as soon as the editor's URL opens (startEarly.ts) or the
// editor route loads, so its script downloads and compiles while the beam itself is still being
// fetched (it is kept for later beams too). Its answers are kept here, not only handed to
// listeners, so an answer that comes before the editor subscribes is not lost.
let worker: Worker | null = null;
const answers = new Map<number, SolveResponse>();
const KEPT_ANSWERS = 8;
const listeners = new Set<(answer: SolveResponse) => void>();

export function getSolverWorker(): Worker | null {
  if (typeof Worker === "undefined") return null;
  if (worker === null) {
    worker = new Worker(new URL("./solver.worker.ts", import.meta.url), { type: "module" });
    worker.addEventListener("message", (event: MessageEvent<SolveResponse>) => {
      answers.set(event.data.seq, event.data);
      if (answers.size > KEPT_ANSWERS) answers.delete(answers.keys().next().value!);
      for (const listener of listeners) listener(event.data);
    });
  }
  return worker;
}

let lastSeq = 0;

/** Request numbers unique across editors, so each hook recognises only its own answers. */
export function nextSolveSeq(): number {
  lastSeq += 1;
  return lastSeq;
}

/** Asks the worker to solve `model` (exchange format); the request's number, or null without workers. */
export function requestSolve(model: unknown): number | null {
  const w = getSolverWorker();
  if (!w) return null;
  const seq = nextSolveSeq();
  w.postMessage({ seq, model });
  return seq;
}

/** The answer to request `seq` if it has come (one of the last few). */
export function solveAnswer(seq: number): SolveResponse | undefined {
  return answers.get(seq);
}

/** Calls `listener` with every answer from now on; returns the unsubscribe. */
export function onSolveAnswer(listener: (answer: SolveResponse) => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
