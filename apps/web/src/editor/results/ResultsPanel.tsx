import { Suspense, useRef, useState } from "react";
import { useEditor, useEditorStore } from "../store/useEditor";
import { useElementWidth } from "../view/useElementWidth";
import type { AnalysisState } from "./useAnalysis";
import { DiagramsStage } from "./DiagramsStage";
import { ResultTargetSelect } from "./ResultTargetSelect";
import { ResultsReadout } from "./ResultsReadout";
import { defaultTarget, targetName } from "./resultSeries";
import { EditorChecks, SectionAtCursor } from "../design/lazyDesign";

type ResultsTab = "diagrams" | "checks";
const resultsTabs: readonly { id: ResultsTab; label: string }[] = [
  { id: "diagrams", label: "Diagrams" },
  { id: "checks", label: "Checks" },
];

/** Live results under the canvas: diagrams on the canvas's x scale with exact numbers beside
 * them and the section at a picked x; and the member checks. */
export function ResultsPanel({ state }: { state: AnalysisState }) {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const chosen = useEditor((s) => s.ui.resultTarget);
  const camera = useEditor((s) => s.ui.camera);
  const hoverX = useEditor((s) => s.ui.hoverX);
  const sectionX = useEditor((s) => s.ui.sectionX);
  const selection = useEditor((s) => s.ui.selection);
  const [tab, setTab] = useState<ResultsTab>("diagrams");
  const container = useRef<HTMLDivElement>(null);
  const width = useElementWidth(container);
  const target = chosen ?? defaultTarget(doc);
  const name = target ? targetName(doc, target) : null;
  const isEnvelope = target?.kind === "envelope";

  return (
    <section aria-label="Results" className="space-y-2">
      <div className="flex flex-wrap items-center gap-3">
        <h2 className="text-sm font-semibold text-ink-900">Results</h2>
        {/* A toggle rather than ARIA tabs: the tables below own the page's one tab list and panel. */}
        <div role="group" aria-label="Results view" className="flex gap-1">
          {resultsTabs.map((t) => (
            <button
              key={t.id}
              type="button"
              aria-pressed={tab === t.id}
              onClick={() => setTab(t.id)}
              className={`rounded-sm px-2 py-0.5 text-sm ${tab === t.id ? "bg-ink-800 text-paper-50" : "text-paper-700 hover:bg-paper-200"}`}
            >
              {t.label}
            </button>
          ))}
        </div>
        {tab === "diagrams" && <ResultTargetSelect doc={doc} value={target} onChange={(t) => store.setUi({ resultTarget: t })} />}
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
      {tab === "diagrams" ? (
        <div className="space-y-3">
          <div className="grid grid-cols-1 gap-3 xl:grid-cols-[1fr_20rem]">
            <div ref={container} className="min-w-0 overflow-hidden rounded-md border border-paper-300">
              {state.status === "ready" && name ? (
                <DiagramsStage analysis={state.analysis} name={name} isEnvelope={isEnvelope} camera={camera} width={width} units={doc.units} hoverX={hoverX} onHover={(x) => store.setUi({ hoverX: x })} onPick={(x) => store.setUi({ sectionX: x })} pickedX={sectionX} />
              ) : (
                <p className="p-4 text-sm text-paper-600">{state.status === "solving" ? "Solving…" : name ? "No diagrams until the model solves." : "Add a load case to see results."}</p>
              )}
            </div>
            {state.status === "ready" && name && <ResultsReadout analysis={state.analysis} name={name} isEnvelope={isEnvelope} hoverX={hoverX} units={doc.units} />}
          </div>
          {state.status === "ready" && (
            <Suspense fallback={null}>
              <SectionAtCursor doc={doc} analysis={state.analysis} name={isEnvelope ? null : name} x={sectionX} onX={(x) => store.setUi({ sectionX: x })} />
            </Suspense>
          )}
        </div>
      ) : (
        <div role="region" aria-label="Member checks on this beam" className="rounded-md border border-paper-300 bg-white">
          {state.status === "ready" ? (
            <Suspense fallback={<p className="p-4 text-sm text-paper-600">Loading the checks…</p>}>
              <EditorChecks doc={doc} analysis={state.analysis} segmentId={selection?.kind === "segment" ? selection.id : null} />
            </Suspense>
          ) : (
            <p className="p-4 text-sm text-paper-600">{state.status === "solving" ? "Solving…" : "The checks need a beam that solves."}</p>
          )}
        </div>
      )}
    </section>
  );
}
