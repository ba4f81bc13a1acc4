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

/** The solver-relevant part of the document; title and display units do not change results. */
function solverInput(doc: BeamDocument) {
  return { nodes: doc.nodes, segments: doc.segments, loadCases: doc.loadCases, combinations: doc.combinations, theory: doc.theory, stations: doc.stations };
}

/**
 * Solves the document on every change in a Web Worker (the newest request wins; stale answers are
 * dropped). There is deliberately no main-thread fallback: it would pull the whole engine (and its
 * matrix library) into the editor chunk, which only needs the engine's result readers.
 */
export function useAnalysis(doc: BeamDocument): AnalysisState {
  const input = solverInput(doc);
  // Re-solve only when a solver-relevant field changed (arrays are replaced on every edit).
  const model = useMemo(() => toExchange(doc), [input.nodes, input.segments, input.loadCases, input.combinations, input.theory, input.stations]); // eslint-disable-line react-hooks/exhaustive-deps
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
