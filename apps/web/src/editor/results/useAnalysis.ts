import { useEffect, useMemo, useState } from "react";
import type { Analysis } from "@spanwright/solver";
import type { BeamDocument } from "../model/BeamDocument";
import { toExchange } from "../model/exchange";
import type { SolveFailure, SolveResponse } from "./solveMessages";
import { onSolveAnswer, presolvedSeq, requestSolve, solveAnswer } from "./solverWorker";

export type AnalysisState =
  | { readonly status: "solving"; readonly analysis: null; readonly error: null }
  | { readonly status: "ready"; readonly analysis: Analysis; readonly error: null }
  | { readonly status: "failed"; readonly analysis: null; readonly error: SolveFailure };

const solving: AnalysisState = { status: "solving", analysis: null, error: null };
const noWorker: AnalysisState = {
  status: "failed",
  analysis: null,
  error: { code: "internal", message: "This browser cannot run the engine in the background (no Web Worker support).", where: "" },
};

function toState(response: SolveResponse): AnalysisState {
  return response.ok ? { status: "ready", analysis: response.analysis, error: null } : { status: "failed", analysis: null, error: response.error };
}

function stateOf(seq: number | null): AnalysisState | null {
  if (seq === null) return noWorker;
  const answer = solveAnswer(seq);
  return answer ? toState(answer) : null;
}

/**
 * Solves the document on every change in a Web Worker (the newest request wins; stale answers are
 * dropped). There is deliberately no main-thread fallback: it would pull the whole engine (and its
 * matrix library) into the editor chunk, which only needs the engine's result readers.
 */
export function useAnalysis(doc: BeamDocument): AnalysisState {
  // Re-solve only when a field the engine reads changed (edits replace those arrays); the title
  // and display units do not change results, so renaming or switching units does not re-solve.
  const { nodes, segments, loadCases, combinations, theory, stations } = doc;
  const model = useMemo(
    () => toExchange({ title: "", units: "si", nodes, segments, loadCases, combinations, theory, stations }),
    [nodes, segments, loadCases, combinations, theory, stations],
  );
  // Asked while rendering, not in an effect after the commit: the worker solves while React still
  // renders and draws the rest of the editor, so a beam's first diagrams come sooner. One request
  // per model; a render React discards costs only a solve whose answer nobody reads. A beam just
  // opened may have been solved already, from the saved model (presolveSaved).
  const seq = useMemo(() => presolvedSeq(model) ?? requestSolve(model), [model]);
  // Until the answer comes, the last state stays (the diagrams do not flicker while typing).
  const [state, setState] = useState<AnalysisState>(() => stateOf(seq) ?? solving);

  useEffect(() => {
    const known = stateOf(seq);
    if (known) setState(known);
    if (seq === null) return;
    return onSolveAnswer((answer) => {
      if (answer.seq === seq) setState(toState(answer));
    });
  }, [seq]);

  return state;
}
