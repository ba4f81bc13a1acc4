import { addLoad, deleteLoad, editLoad } from "../commands/loadCommands";
import type { BeamDocument, Load, LoadType } from "../model/BeamDocument";
import { createLoadId, type CaseId } from "../model/ids";
import { QuantityInput } from "../fields/QuantityInput";
import { useEditor, useEditorStore } from "../store/useEditor";
import type { EditorStore } from "../store/EditorStore";
import { navigateGrid, tableClasses as c } from "./gridNavigation";
import { ChoiceInput } from "../fields/ChoiceInput";
import { useCanEdit } from "../store/useCanEdit";

const typeLabels: Record<LoadType, string> = { point: "Point", moment: "Moment", distributed: "Distributed", settlement: "Settlement" };

/** A new load in the middle of the first span, for the add buttons (values are typed next). */
function starterLoad(doc: BeamDocument, type: LoadType): Load {
  const a = doc.nodes[0]?.x ?? 0;
  const b = doc.nodes[1]?.x ?? a + 1;
  const id = createLoadId();
  switch (type) {
    case "point":
      return { id, type, x: (a + b) / 2, fy: -10_000 };
    case "moment":
      return { id, type, x: (a + b) / 2, mz: 10_000 };
    case "distributed":
      return { id, type, x1: a, x2: b, qy1: -5_000, qy2: -5_000 };
    case "settlement": {
      const node = doc.nodes.find((n) => n.support && n.support.type !== "guided") ?? doc.nodes[0]!;
      return { id, type, node: node.id, uy: -0.005 };
    }
  }
}

interface LoadRowProps {
  readonly load: Load;
  readonly index: number;
  readonly store: EditorStore;
  readonly doc: BeamDocument;
  readonly caseId: CaseId;
  readonly readOnly: boolean;
}

function LoadRow({ load, index, store, doc, caseId, readOnly }: LoadRowProps) {
  const units = doc.units;
  const edit = (next: Load) => store.run((d) => editLoad(d, { loadId: load.id, load: next }));
  const label = `Load ${index + 1}`;
  const position =
    load.type === "settlement" ? (
      <ChoiceInput label={`${label} node`} className={c.select} value={load.node} readOnly={readOnly}
        choices={doc.nodes.map((n, i) => ({ value: n.id, label: `Node ${i + 1}` }))} onChange={(node) => edit({ ...load, node })} />
    ) : (
      <QuantityInput label={`${label} ${load.type === "distributed" ? "x1" : "x"}`} value={load.type === "distributed" ? load.x1 : load.x} kind="position" units={units} readOnly={readOnly}
        onCommit={(x) => edit(load.type === "distributed" ? { ...load, x1: x } : { ...load, x })} />
    );
  const end = load.type === "distributed" ? <QuantityInput label={`${label} x2`} value={load.x2} kind="position" units={units} readOnly={readOnly} onCommit={(x2) => edit({ ...load, x2 })} /> : null;
  const value =
    load.type === "point" ? <QuantityInput label={`${label} force`} value={load.fy} kind="force" units={units} readOnly={readOnly} onCommit={(fy) => edit({ ...load, fy })} />
    : load.type === "moment" ? <QuantityInput label={`${label} moment`} value={load.mz} kind="moment" units={units} readOnly={readOnly} onCommit={(mz) => edit({ ...load, mz })} />
    : load.type === "distributed" ? <QuantityInput label={`${label} intensity at x1`} value={load.qy1} kind="distributed" units={units} readOnly={readOnly} onCommit={(qy1) => edit({ ...load, qy1 })} />
    : <QuantityInput label={`${label} settlement`} value={load.uy} kind="settlement" units={units} readOnly={readOnly} onCommit={(uy) => edit({ ...load, uy })} />;
  const value2 = load.type === "distributed" ? <QuantityInput label={`${label} intensity at x2`} value={load.qy2} kind="distributed" units={units} readOnly={readOnly} onCommit={(qy2) => edit({ ...load, qy2 })} /> : null;
  return (
    <>
      <td className={c.td}>{typeLabels[load.type]}</td>
      <td className={c.td}>{position}</td>
      <td className={c.td}>{end}</td>
      <td className={c.td}>{value}</td>
      <td className={c.td}>{value2}</td>
      <td className={c.td}>
        <ChoiceInput label={`${label} load case`} className={c.select} value={caseId} readOnly={readOnly}
          choices={doc.loadCases.map((lc) => ({ value: lc.id, label: lc.name }))}
          onChange={(next) => store.run((d) => editLoad(d, { loadId: load.id, load, caseId: next }))} />
      </td>
      <td className={c.td}>
        <button type="button" className={c.smallButton} aria-label={`Delete ${label.toLowerCase()}`} disabled={readOnly} onClick={() => store.run((d) => deleteLoad(d, { loadId: load.id }))}>Delete</button>
      </td>
    </>
  );
}

/** Loads of the active case. Gravity loads are negative (the contract's y points up). */
export function LoadsTable() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const activeCaseId = useEditor((s) => s.ui.activeCaseId);
  const selection = useEditor((s) => s.ui.selection);
  const readOnly = !useCanEdit();
  const loadCase = doc.loadCases.find((lc) => lc.id === activeCaseId);
  if (!loadCase) return <p className="p-2 text-sm text-paper-600">Add a load case to enter loads.</p>;
  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <label className="flex items-center gap-1">
          <span className="text-paper-700">Load case</span>
          <select aria-label="Load case for the loads table" className={c.select} value={loadCase.id} onChange={(e) => store.setUi({ activeCaseId: e.target.value as CaseId })}>
            {doc.loadCases.map((lc) => (
              <option key={lc.id} value={lc.id}>{lc.name} ({lc.category})</option>
            ))}
          </select>
        </label>
        {(["point", "distributed", "moment", "settlement"] as const).map((t) => (
          <button key={t} type="button" className={c.addButton} disabled={readOnly} onClick={() => {
            const load = starterLoad(store.doc, t);
            if (store.run((d) => addLoad(d, { caseId: loadCase.id, load }))) store.setUi({ selection: { kind: "load", id: load.id } });
          }}>
            + {typeLabels[t]}
          </button>
        ))}
        <span className="text-xs text-paper-600">Downward loads are negative.</span>
      </div>
      <table className={c.table} onKeyDown={navigateGrid}>
        <thead className={c.head}>
          <tr>
            <th className={c.th}>Type</th>
            <th className={c.th}>x / x1 / node</th>
            <th className={c.th}>x2</th>
            <th className={c.th}>Value / at x1</th>
            <th className={c.th}>at x2</th>
            <th className={c.th}>Case</th>
            <th className={c.th}><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {loadCase.loads.map((l, i) => (
            <tr key={l.id} className={c.row(selection?.kind === "load" && selection.id === l.id)} onFocus={() => store.setUi({ selection: { kind: "load", id: l.id } })}>
              <LoadRow load={l} index={i} store={store} doc={doc} caseId={loadCase.id} readOnly={readOnly} />
            </tr>
          ))}
        </tbody>
      </table>
      {loadCase.loads.length === 0 && <p className="text-sm text-paper-600">No loads in {loadCase.name} yet.</p>}
    </div>
  );
}
