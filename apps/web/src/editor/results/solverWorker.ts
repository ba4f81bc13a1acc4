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

/**
 * The saved revision's model, solved as soon as the API has sent it (startEarly.ts), before the
 * editor has loaded: when the editor's document reads back to the same model, its first render
 * already has the answer, and the diagrams come with the first paint of the canvas.
 */
let saved: { seq: number } | null = null;

export function presolveSaved(model: unknown): void {
  const w = getSolverWorker();
  if (!w) return;
  saved = { seq: nextSolveSeq() };
  w.postMessage({ seq: saved.seq, model, saved: true });
}

/** The request number of the saved model's answer when it has come and solved `model` (once). */
export function presolvedSeq(model: unknown): number | null {
  if (saved === null) return null;
  const answer = answers.get(saved.seq);
  if (!answer) return null; // not yet: the editor asks for itself
  saved = null;
  return answer.model === JSON.stringify(model) ? answer.seq : null;
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
