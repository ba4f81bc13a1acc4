import { useRef } from "react";
import { useEditor, useEditorStore } from "../store/useEditor";
import { useElementWidth } from "../view/useElementWidth";
import type { AnalysisState } from "./useAnalysis";
import { DiagramsStage } from "./DiagramsStage";
import { ResultTargetSelect } from "./ResultTargetSelect";
import { ResultsReadout } from "./ResultsReadout";
import { defaultTarget, targetName } from "./resultSeries";

/** Live results under the canvas: diagrams on the canvas's x scale, and exact numbers beside them. */
export function ResultsPanel({ state }: { state: AnalysisState }) {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const chosen = useEditor((s) => s.ui.resultTarget);
  const camera = useEditor((s) => s.ui.camera);
  const hoverX = useEditor((s) => s.ui.hoverX);
  const container = useRef<HTMLDivElement>(null);
  const width = useElementWidth(container);
  const target = chosen ?? defaultTarget(doc);
  const name = target ? targetName(doc, target) : null;
  const isEnvelope = target?.kind === "envelope";

  return (
    <section aria-label="Results" className="space-y-2">
      <div className="flex flex-wrap items-center gap-3">
        <h2 className="text-sm font-semibold text-ink-900">Results</h2>
        <ResultTargetSelect doc={doc} value={target} onChange={(t) => store.setUi({ resultTarget: t })} />
        <span className="text-xs text-paper-600" aria-live="polite">
          {state.status === "solving" ? "Solving…" : state.status === "ready" ? "Up to date" : ""}
        </span>
      </div>
      {state.status === "failed" && (
        <div role="alert" className="rounded-md border-l-4 border-danger-600 bg-danger-50 px-3 py-2 text-sm text-danger-700">
          <p className="font-semibold">{state.error.code === "mechanism" ? "The beam cannot carry load" : "The model cannot be solved yet"}</p>
          <p>{state.error.message}</p>
          {state.error.where && <p className="text-xs">Where: {state.error.where} (highlighted on the beam)</p>}
        </div>
      )}
      <div className="grid grid-cols-1 gap-3 xl:grid-cols-[1fr_20rem]">
        <div ref={container} className="min-w-0 overflow-hidden rounded-md border border-paper-300">
          {state.status === "ready" && name ? (
            <DiagramsStage analysis={state.analysis} name={name} isEnvelope={isEnvelope} camera={camera} width={width} units={doc.units} hoverX={hoverX} onHover={(x) => store.setUi({ hoverX: x })} />
          ) : (
            <p className="p-4 text-sm text-paper-600">{state.status === "solving" ? "Solving…" : name ? "No diagrams until the model solves." : "Add a load case to see results."}</p>
          )}
        </div>
        {state.status === "ready" && name && <ResultsReadout analysis={state.analysis} name={name} isEnvelope={isEnvelope} hoverX={hoverX} units={doc.units} />}
      </div>
    </section>
  );
}
