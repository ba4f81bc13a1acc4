import { useEffect, useMemo, useRef, useState } from "react";
import type { Analysis } from "@spanwright/solver";
import type { BeamDocument } from "../model/BeamDocument";
import { toExchange } from "../model/exchange";
import type { SolveFailure, SolveRequest, SolveResponse } from "./solveMessages";
import { getSolverWorker, nextSolveSeq } from "./solverWorker";

export type AnalysisState =
  | { readonly status: "solving"; readonly analysis: null; readonly error: null }
  | { readonly status: "ready"; readonly analysis: Analysis; readonly error: null }
  | { readonly status: "failed"; readonly analysis: null; readonly error: SolveFailure };

const solving: AnalysisState = { status: "solving", analysis: null, error: null };

function toState(response: SolveResponse): AnalysisState {
  return response.ok ? { status: "ready", analysis: response.analysis, error: null } : { status: "failed", analysis: null, error: response.error };
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
  const [state, setState] = useState<AnalysisState>(solving);
  const seq = useRef(0);

  useEffect(() => {
    const w = getSolverWorker();
    if (!w) return;
    const onMessage = (event: MessageEvent<SolveResponse>) => {
      if (event.data.seq === seq.current) setState(toState(event.data));
    };
    w.addEventListener("message", onMessage);
    return () => w.removeEventListener("message", onMessage);
  }, []);

  useEffect(() => {
    const w = getSolverWorker();
    seq.current = nextSolveSeq();
    if (w) {
      const request: SolveRequest = { seq: seq.current, model };
      w.postMessage(request);
      return;
    }
    setState({ status: "failed", analysis: null, error: { code: "internal", message: "This browser cannot run the engine in the background (no Web Worker support).", where: "" } });
  }, [model]);

  return state;
}
