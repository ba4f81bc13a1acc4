import { startTransition, useEffect, useMemo, useState } from "react";
import { useEditor, useEditorStore } from "./store/useEditor";
import { useAnalysis } from "./results/useAnalysis";
import { locateError } from "./results/errorLocation";
import { ResultsPanel } from "./results/ResultsPanel";
import { EditorCanvas } from "./view/EditorCanvas";
import { Palette } from "./view/Palette";
import { CaseFilter } from "./view/CaseFilter";
import { GridStepField } from "./view/GridStepField";
import { Inspector } from "./view/Inspector";
import { useShortcuts } from "./view/useShortcuts";
import { NodesTable } from "./tables/NodesTable";
import { SegmentsTable } from "./tables/SegmentsTable";
import { LoadsTable } from "./tables/LoadsTable";
import { CasesTable } from "./tables/CasesTable";
import { CombinationsTable } from "./tables/CombinationsTable";
import { TheorySettings } from "./design/TheorySettings";
import { preloadDesignParts } from "./design/lazyDesign";

const tabs = [
  { id: "nodes", label: "Nodes", Component: NodesTable },
  { id: "segments", label: "Segments", Component: SegmentsTable },
  { id: "loads", label: "Loads", Component: LoadsTable },
  { id: "cases", label: "Load cases", Component: CasesTable },
  { id: "combinations", label: "Combinations", Component: CombinationsTable },
] as const;

type TabId = (typeof tabs)[number]["id"];

/** Canvas, inspector, live results and tables for the open beam; everything reads the store. */
export function EditorWorkspace() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const notice = useEditor((s) => s.ui.notice);
  const analysis = useAnalysis(doc);
  const errorRange = useMemo(() => (analysis.status === "failed" ? locateError(analysis.error, doc) : null), [analysis, doc]);
  const [tab, setTab] = useState<TabId>("nodes");
  useShortcuts(store);
  // The table under the results renders just after the first paint (canvas and diagrams first).
  const [tableShown, setTableShown] = useState(false);
  useEffect(() => {
    const frame = requestAnimationFrame(() => startTransition(() => setTableShown(true)));
    return () => cancelAnimationFrame(frame);
  }, []);
  // The design parts (dialogs, checks, theory) load once the first results are on screen.
  const settled = analysis.status !== "solving";
  useEffect(() => {
    if (!settled) return;
    const whenIdle = window.requestIdleCallback ?? ((run: () => void) => window.setTimeout(run, 200));
    whenIdle(() => preloadDesignParts());
  }, [settled]);
  const Active = tabs.find((t) => t.id === tab)!.Component;

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <Palette />
        <div className="flex flex-wrap items-center gap-4">
          <CaseFilter />
          <GridStepField />
        </div>
      </div>
      {notice && (
        <div role={notice.tone === "error" ? "alert" : "status"} className={`flex items-center justify-between rounded-md px-3 py-1.5 text-sm ${notice.tone === "error" ? "bg-danger-50 text-danger-700" : "bg-paper-100 text-paper-700"}`}>
          <span>{notice.text}</span>
          <button type="button" className="text-xs underline" onClick={() => store.setUi({ notice: null })}>Dismiss</button>
        </div>
      )}
      <div className="grid grid-cols-1 gap-3 xl:grid-cols-[1fr_20rem]">
        <EditorCanvas errorRange={errorRange} />
        <aside aria-label="Inspector" className="rounded-md border border-paper-300 bg-white p-3">
          <Inspector />
        </aside>
      </div>
      <TheorySettings />
      <ResultsPanel state={analysis} />
      <section aria-label="Tables" className="rounded-md border border-paper-300 bg-white">
        <div role="tablist" aria-label="Tables" className="flex gap-1 border-b border-paper-300 px-2 pt-2">
          {tabs.map((t) => (
            <button
              key={t.id}
              type="button"
              role="tab"
              id={`tab-${t.id}`}
              aria-selected={tab === t.id}
              aria-controls="editor-table-panel"
              onClick={() => setTab(t.id)}
              className={`rounded-t-sm px-3 py-1.5 text-sm ${tab === t.id ? "border border-b-0 border-paper-300 bg-white font-semibold text-ink-900" : "text-paper-700 hover:bg-paper-100"}`}
            >
              {t.label}
            </button>
          ))}
        </div>
        <div id="editor-table-panel" role="tabpanel" aria-labelledby={`tab-${tab}`} className="overflow-x-auto p-2">
          {tableShown ? <Active /> : <p className="p-2 text-sm text-paper-600">Loading the table…</p>}
        </div>
      </section>
    </div>
  );
}
