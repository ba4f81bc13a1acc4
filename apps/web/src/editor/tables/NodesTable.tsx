import { deleteNode, moveNode, setSpringStiffness, setSupport, toggleHinge } from "../commands/nodeCommands";
import type { SupportType } from "../model/BeamDocument";
import type { NodeId } from "../model/ids";
import { supportTypes } from "../model/BeamDocument";
import { QuantityInput } from "../fields/QuantityInput";
import { CheckInput, ChoiceInput } from "../fields/ChoiceInput";
import { useCanEdit } from "../store/useCanEdit";
import { useEditor, useEditorStore } from "../store/useEditor";
import { defaultSupport } from "../tools/placeSupport/placeSupportTool";
import { navigateGrid, tableClasses as c } from "./gridNavigation";

const supportLabels: Record<SupportType | "none", string> = { none: "none", pinned: "pinned", fixed: "fixed", guided: "guided", spring: "spring" };
const supportChoices = (["none", ...supportTypes] as const).map((t) => ({ value: t, label: supportLabels[t] }));

export function NodesTable() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const selection = useEditor((s) => s.ui.selection);
  const units = doc.units;
  const readOnly = !useCanEdit();
  const setSpring = (nodeId: NodeId, stiffness: { ky?: number | null; kr?: number | null }) =>
    store.run((d) => setSpringStiffness(d, { nodeId, ...stiffness }));
  return (
    <table className={c.table} onKeyDown={navigateGrid}>
      <thead className={c.head}>
        <tr>
          <th className={c.th}>Node</th>
          <th className={c.th}>x</th>
          <th className={c.th}>Support</th>
          <th className={c.th}>Spring ky</th>
          <th className={c.th}>Spring kr</th>
          <th className={c.th}>Hinge</th>
          <th className={c.th}><span className="sr-only">Actions</span></th>
        </tr>
      </thead>
      <tbody>
        {doc.nodes.map((n, i) => {
          const isSpring = n.support?.type === "spring";
          return (
            <tr key={n.id} className={c.row(selection?.kind === "node" && selection.id === n.id)} onFocus={() => store.setUi({ selection: { kind: "node", id: n.id } })}>
              <td className={`${c.td} text-paper-600`}>{i + 1}</td>
              <td className={c.td}>
                <QuantityInput label={`Node ${i + 1} x`} value={n.x} kind="position" units={units} readOnly={readOnly} onCommit={(x) => store.run((d) => moveNode(d, { nodeId: n.id, x }))} />
              </td>
              <td className={c.td}>
                <ChoiceInput
                  label={`Node ${i + 1} support`}
                  className={c.select}
                  value={n.support?.type ?? "none"}
                  choices={supportChoices}
                  readOnly={readOnly}
                  onChange={(type) => store.run((d) => setSupport(d, { nodeId: n.id, support: type === "none" ? null : defaultSupport(type) }))}
                />
              </td>
              <td className={c.td}>
                {isSpring && n.support?.type === "spring" ? (
                  <QuantityInput label={`Node ${i + 1} ky`} value={n.support.ky} kind="springK" units={units} readOnly={readOnly} onCommit={(ky) => setSpring(n.id, { ky })} onClear={() => setSpring(n.id, { ky: null })} />
                ) : null}
              </td>
              <td className={c.td}>
                {isSpring && n.support?.type === "spring" ? (
                  <QuantityInput label={`Node ${i + 1} kr`} value={n.support.kr} kind="springKr" units={units} readOnly={readOnly} onCommit={(kr) => setSpring(n.id, { kr })} onClear={() => setSpring(n.id, { kr: null })} />
                ) : null}
              </td>
              <td className={`${c.td} text-center`}>
                <CheckInput label={`Node ${i + 1} hinge`} checked={n.hinge} readOnly={readOnly} onChange={() => store.run((d) => toggleHinge(d, { nodeId: n.id }))} />
              </td>
              <td className={c.td}>
                <button type="button" className={c.smallButton} aria-label={`Delete node ${i + 1}`} onClick={() => store.run((d) => deleteNode(d, { nodeId: n.id }))} disabled={readOnly || doc.nodes.length <= 2}>
                  Delete
                </button>
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
