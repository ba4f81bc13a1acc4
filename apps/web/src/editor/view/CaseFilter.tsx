import type { CaseId } from "../model/ids";
import { useEditor, useEditorStore } from "../store/useEditor";
import { caseColor } from "./colors";

/** Which load cases the canvas shows, and which case new loads go into. */
export function CaseFilter() {
  const store = useEditorStore();
  const cases = useEditor((s) => s.history.doc.loadCases);
  const visible = useEditor((s) => s.ui.visibleCases);
  const active = useEditor((s) => s.ui.activeCaseId);
  const toggle = (id: CaseId) => {
    const next = new Set(visible ?? cases.map((c) => c.id));
    if (next.has(id)) next.delete(id);
    else next.add(id);
    store.setUi({ visibleCases: next.size === cases.length ? null : next });
  };
  return (
    <div className="flex flex-wrap items-center gap-3 text-xs" role="group" aria-label="Load cases on the canvas">
      <span className="text-paper-600">Show:</span>
      {cases.map((c, i) => (
        <label key={c.id} className="flex items-center gap-1">
          <input type="checkbox" checked={!visible || visible.has(c.id)} onChange={() => toggle(c.id)} />
          <span className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: caseColor(i) }} />
          {c.name}
        </label>
      ))}
      <label className="ml-2 flex items-center gap-1">
        <span className="text-paper-600">New loads go to</span>
        <select aria-label="Case for new loads" className="rounded-sm border border-paper-300 bg-white px-1 py-0.5" value={active ?? ""} onChange={(e) => store.setUi({ activeCaseId: e.target.value as CaseId })}>
          {cases.map((c) => (
            <option key={c.id} value={c.id}>{c.name}</option>
          ))}
        </select>
      </label>
    </div>
  );
}
