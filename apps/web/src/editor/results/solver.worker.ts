/// <reference lib="webworker" />
import type { SolveRequest } from "./solveMessages";
import { handleSolveRequest } from "./handleSolveRequest";

// Runs the engine off the main thread so typing and dragging stay smooth. The analysis is plain
// data (numbers and Float64Arrays) and crosses back by structured clone.
const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<SolveRequest>) => {
  scope.postMessage(handleSolveRequest(event.data));
};
