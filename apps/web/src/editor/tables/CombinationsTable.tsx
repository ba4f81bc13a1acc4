import { deleteCombination, editCombination, setCombinationFactor } from "../commands/caseCommands";
import { TextInput } from "../fields/TextInput";
import { QuantityInput } from "../fields/QuantityInput";
import { useEditor, useEditorStore } from "../store/useEditor";
import { findAction } from "../actions/editorActions";
import { navigateGrid, tableClasses as c } from "./gridNavigation";
import { GenerateCombinationsButton } from "../design/GenerateCombinationsButton";
import { useCanEdit } from "../store/useCanEdit";

/** Combinations as a grid of factors, one column per load case; an empty cell leaves the case out. */
export function CombinationsTable() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const selection = useEditor((s) => s.ui.selection);
  const readOnly = !useCanEdit();
  const addCombination = findAction("add-combination");
  const canAdd = useEditor(addCombination.isEnabled);
  return (
    <div className="space-y-2">
      <table className={c.table} onKeyDown={navigateGrid}>
        <thead className={c.head}>
          <tr>
            <th className={c.th}>Name</th>
            {doc.loadCases.map((lc) => (
              <th key={lc.id} className={c.th}>× {lc.name}</th>
            ))}
            <th className={c.th}><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {doc.combinations.map((k) => (
            <tr key={k.id} className={c.row(selection?.kind === "combination" && selection.id === k.id)} onFocus={() => store.setUi({ selection: { kind: "combination", id: k.id } })}>
              <td className={c.td}>
                <TextInput label={`Combination ${k.name} name`} value={k.name} readOnly={readOnly} onCommit={(name) => store.run((d) => editCombination(d, { combinationId: k.id, name }))} />
              </td>
              {doc.loadCases.map((lc) => (
                <td key={lc.id} className={c.td}>
                  <QuantityInput
                    label={`Combination ${k.name} factor on ${lc.name}`}
                    value={k.factors.find((f) => f.caseId === lc.id)?.factor}
                    kind="factor"
                    units={doc.units}
                    readOnly={readOnly}
                    onCommit={(factor) => store.run((d) => setCombinationFactor(d, { combinationId: k.id, caseId: lc.id, factor }))}
                    onClear={() => store.run((d) => setCombinationFactor(d, { combinationId: k.id, caseId: lc.id, factor: null }))}
                  />
                </td>
              ))}
              <td className={c.td}>
                <button type="button" className={c.smallButton} aria-label={`Delete combination ${k.name}`} disabled={readOnly} onClick={() => store.run((d) => deleteCombination(d, { combinationId: k.id }))}>Delete</button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="flex gap-2">
        <button type="button" className={c.addButton} disabled={!canAdd} onClick={() => addCombination.run(store)}>+ Combination</button>
        <GenerateCombinationsButton className={c.addButton} />
      </div>
    </div>
  );
}
