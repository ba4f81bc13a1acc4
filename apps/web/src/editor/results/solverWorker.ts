// One engine worker for the app, started as soon as the editor route loads so its script downloads
// and compiles while the beam itself is still being fetched (it is kept for later beams too).
let worker: Worker | null = null;

export function getSolverWorker(): Worker | null {
  if (typeof Worker === "undefined") return null;
  worker ??= new Worker(new URL("./solver.worker.ts", import.meta.url), { type: "module" });
  return worker;
}

let lastSeq = 0;

/** Request numbers unique across editors, so each hook recognises only its own answers. */
export function nextSolveSeq(): number {
  lastSeq += 1;
  return lastSeq;
}
