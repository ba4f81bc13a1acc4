import { useRef } from "react";
import { Link, useParams } from "react-router";
import { replaceDocument, setTheory, setUnits } from "../commands/documentCommands";
import { createTemplate, templateLabels, type TemplateId } from "../model/templates";
import type { Theory } from "../model/BeamDocument";
import { defaultGridStep } from "../geometry/snapping";
import { downloadText, exportModelText, importModelText } from "../persistence/importModel";
import { useEditor, useEditorStore } from "../store/useEditor";
import { unitSystemIds, unitSystemLabels, type UnitSystemId } from "../units/unitSystems";
import { fitCamera } from "../geometry/camera";
import { Button } from "../../components/Button";
import { useCanEdit } from "../store/useCanEdit";

const selectClass = "rounded-sm border border-paper-300 bg-white px-1 py-0.5 text-sm";

export interface EditorHeaderProps {
  readonly beamName: string;
  readonly version: number;
  readonly isDirty: boolean;
  readonly canSave: boolean;
  readonly saving: boolean;
  readonly onSave: () => void;
}

/** Beam-level controls: units, theory, templates, import/export and save. */
export function EditorHeader({ beamName, version, isDirty, canSave, saving, onSave }: EditorHeaderProps) {
  const store = useEditorStore();
  const units = useEditor((s) => s.history.doc.units);
  const theory = useEditor((s) => s.history.doc.theory);
  const fileInput = useRef<HTMLInputElement>(null);
  const { projectId, beamId } = useParams();
  // Units are saved with the model, so changing them is an edit too.
  const readOnly = !useCanEdit();

  const open = (label: string, next: ReturnType<typeof createTemplate>) => {
    if (store.run((d) => replaceDocument(d, { next, label }))) {
      const { doc } = store;
      store.setUi({ camera: fitCamera(doc.nodes[0]?.x ?? 0, doc.nodes[doc.nodes.length - 1]?.x ?? 1, store.getState().ui.viewportWidth), selection: null });
    }
  };

  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
      <h1 className="text-xl font-semibold text-ink-900">{beamName}</h1>
      <span className="text-sm text-paper-600">
        r{version} {isDirty ? <span className="font-medium text-ochre-700">· unsaved changes</span> : <span>· saved</span>}
      </span>
      <label className="flex items-center gap-1 text-sm">
        <span className="text-paper-700">Units</span>
        <select aria-label="Display units" className={selectClass} value={units} disabled={readOnly} onChange={(e) => {
          const next = e.target.value as UnitSystemId;
          store.run((d) => setUnits(d, { units: next }));
          store.setUi({ gridStep: defaultGridStep[next] });
        }}>
          {unitSystemIds.map((u) => <option key={u} value={u}>{unitSystemLabels[u]}</option>)}
        </select>
      </label>
      <label className="flex items-center gap-1 text-sm">
        <span className="text-paper-700">Theory</span>
        <select aria-label="Beam theory" className={selectClass} value={theory} disabled={readOnly} onChange={(e) => store.run((d) => setTheory(d, { theory: e.target.value as Theory }))}>
          <option value="euler-bernoulli">Euler-Bernoulli</option>
          <option value="timoshenko">Timoshenko (needs A, G, κ)</option>
        </select>
      </label>
      <select aria-label="Start from a template" className={selectClass} value="" disabled={readOnly} onChange={(e) => {
        const id = e.target.value as TemplateId;
        if (id) open(`New from template: ${templateLabels[id]}`, createTemplate(id, units));
      }}>
        <option value="">Start from template…</option>
        {(Object.keys(templateLabels) as TemplateId[]).map((id) => <option key={id} value={id}>{templateLabels[id]}</option>)}
      </select>
      <Button size="sm" variant="secondary" onClick={() => downloadText(`${beamName.replace(/[^\w.-]+/g, "-")}.spanwright.json`, exportModelText(store.doc))}>Export JSON</Button>
      <Button size="sm" variant="secondary" disabled={readOnly} onClick={() => fileInput.current?.click()}>Import JSON</Button>
      <input ref={fileInput} type="file" accept="application/json,.json" className="hidden" aria-label="Import a beam model file" onChange={async (e) => {
        const file = e.target.files?.[0];
        e.target.value = "";
        if (!file) return;
        const result = importModelText(await file.text(), units);
        if (result.ok) open(`Import ${file.name}`, result.doc);
        else store.setUi({ notice: { tone: "error", text: result.message } });
      }} />
      {projectId && beamId && (
        <nav aria-label="Beam pages" className="flex items-center gap-3">
          <Link to={`/projects/${projectId}/beams/${beamId}/design`} className="text-sm text-ink-700 underline hover:text-ink-900" title="Member checks on the saved revision">
            Design checks
          </Link>
          <Link to={`/projects/${projectId}/beams/${beamId}/revisions`} className="text-sm text-ink-700 underline hover:text-ink-900" title="Saved revisions of this beam, their changes and hand-offs">
            Revisions
          </Link>
        </nav>
      )}
      <div className="ml-auto flex items-center gap-2">
        {!canSave && <span className="text-xs text-paper-600">Read only: your role cannot save revisions.</span>}
        <Button size="sm" variant="primary" onClick={onSave} disabled={!canSave || !isDirty} busy={saving} busyLabel="Saving…" title="Save a new revision (Ctrl+S)">
          Save revision
        </Button>
      </div>
    </div>
  );
}
