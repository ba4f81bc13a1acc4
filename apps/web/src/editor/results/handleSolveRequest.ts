import { tryAnalyze } from "@spanwright/solver";
import type { SolveRequest, SolveResponse } from "./solveMessages";

/** What the worker does with one request: expected failures come back as values with the
 * contract's codes; anything thrown is an engine bug, reported as "internal" rather than lost. */
export function handleSolveRequest({ seq, model }: SolveRequest): SolveResponse {
  try {
    const result = tryAnalyze(model);
    return result.ok ? { seq, ok: true, analysis: result.value } : { seq, ok: false, error: result.error };
  } catch (cause) {
    return { seq, ok: false, error: { code: "internal", message: cause instanceof Error ? cause.message : String(cause), where: "" } };
  }
}
