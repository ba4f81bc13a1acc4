import { deleteLoadCase, editLoadCase } from "../commands/caseCommands";
import { loadCategories } from "../model/BeamDocument";
import { useCanEdit } from "../store/useCanEdit";
import { TextInput } from "../fields/TextInput";
import { useEditor, useEditorStore } from "../store/useEditor";
import { findAction } from "../actions/editorActions";
import { CheckInput, ChoiceInput } from "../fields/ChoiceInput";
import { navigateGrid, tableClasses as c } from "./gridNavigation";

const categoryChoices = loadCategories.map((cat) => ({ value: cat, label: cat }));

export function CasesTable() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const selection = useEditor((s) => s.ui.selection);
  const addCase = findAction("add-load-case");
  const readOnly = !useCanEdit();
  return (
    <div className="space-y-2">
      <table className={c.table} onKeyDown={navigateGrid}>
        <thead className={c.head}>
          <tr>
            <th className={c.th}>Name</th>
            <th className={c.th}>Category</th>
            <th className={c.th} title="Loads may act on any subset of spans; the envelope takes the worst">Pattern</th>
            <th className={c.th}>Loads</th>
            <th className={c.th}><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {doc.loadCases.map((lc) => (
            <tr key={lc.id} className={c.row(selection?.kind === "case" && selection.id === lc.id)} onFocus={() => store.setUi({ selection: { kind: "case", id: lc.id }, activeCaseId: lc.id })}>
              <td className={c.td}>
                <TextInput label={`Case ${lc.name} name`} value={lc.name} readOnly={readOnly} onCommit={(name) => store.run((d) => editLoadCase(d, { caseId: lc.id, name }))} />
              </td>
              <td className={c.td}>
                <ChoiceInput label={`Case ${lc.name} category`} className={c.select} value={lc.category} readOnly={readOnly} choices={categoryChoices}
                  onChange={(category) => store.run((d) => editLoadCase(d, { caseId: lc.id, category }))} />
              </td>
              <td className={`${c.td} text-center`}>
                <CheckInput label={`Case ${lc.name} pattern loading`} checked={lc.pattern} readOnly={readOnly} onChange={(pattern) => store.run((d) => editLoadCase(d, { caseId: lc.id, pattern }))} />
              </td>
              <td className={`${c.td} tabular-nums text-paper-700`}>{lc.loads.length}</td>
              <td className={c.td}>
                <button type="button" className={c.smallButton} aria-label={`Delete case ${lc.name}`} disabled={readOnly} onClick={() => store.run((d) => deleteLoadCase(d, { caseId: lc.id }))}>Delete</button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <button type="button" className={c.addButton} disabled={readOnly} onClick={() => addCase.run(store)}>+ Load case</button>
    </div>
  );
}

