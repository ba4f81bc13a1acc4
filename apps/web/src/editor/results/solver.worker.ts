/// <reference lib="webworker" />
import { tryAnalyze } from "@spanwright/solver";
import type { SolveRequest, SolveResponse } from "./solveMessages";

// Runs the engine off the main thread so typing and dragging stay smooth. The analysis is plain
// data (numbers and Float64Arrays) and crosses back by structured clone.
const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<SolveRequest>) => {
  const { seq, model } = event.data;
  let response: SolveResponse;
  try {
    const result = tryAnalyze(model);
    response = result.ok ? { seq, ok: true, analysis: result.value } : { seq, ok: false, error: result.error };
  } catch (cause) {
    response = { seq, ok: false, error: { code: "internal", message: cause instanceof Error ? cause.message : String(cause), where: "" } };
  }
  scope.postMessage(response);
};
