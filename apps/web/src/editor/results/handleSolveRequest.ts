import { tryAnalyze } from "@spanwright/solver";
import { fromExchange, toExchange, type ExchangeModel } from "../model/exchange";
import type { SolveRequest, SolveResponse } from "./solveMessages";

/** What the worker does with one request: expected failures come back as values with the
 * contract's codes; anything thrown is an engine bug, reported as "internal" rather than lost. */
export function handleSolveRequest(request: SolveRequest): SolveResponse {
  if (!request.saved) return solve(request.seq, request.model);
  let model: ExchangeModel;
  try {
    const read = fromExchange(request.model as ExchangeModel);
    if (!read.ok) return { seq: request.seq, ok: false, error: { code: "internal", message: read.error.message, where: read.error.where } };
    model = toExchange({ ...read.doc, title: "" });
  } catch (cause) {
    // not a model the editor could open either; it will show its own message
    return { seq: request.seq, ok: false, error: { code: "internal", message: cause instanceof Error ? cause.message : String(cause), where: "" } };
  }
  return { ...solve(request.seq, model), model: JSON.stringify(model) };
}

function solve(seq: number, model: unknown): SolveResponse {
  try {
    const result = tryAnalyze(model);
    return result.ok ? { seq, ok: true, analysis: result.value } : { seq, ok: false, error: result.error };
  } catch (cause) {
    return { seq, ok: false, error: { code: "internal", message: cause instanceof Error ? cause.message : String(cause), where: "" } };
  }
}
