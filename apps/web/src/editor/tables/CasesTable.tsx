import { deleteLoadCase, editLoadCase } from "../commands/caseCommands";
import { loadCategories, type LoadCategory } from "../model/BeamDocument";
import { TextInput } from "../fields/TextInput";
import { useEditor, useEditorStore } from "../store/useEditor";
import { findAction } from "../actions/editorActions";
import { navigateGrid, tableClasses as c } from "./gridNavigation";

export function CasesTable() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const selection = useEditor((s) => s.ui.selection);
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
                <TextInput label={`Case ${lc.name} name`} value={lc.name} onCommit={(name) => store.run((d) => editLoadCase(d, { caseId: lc.id, name }))} />
              </td>
              <td className={c.td}>
                <select aria-label={`Case ${lc.name} category`} className={c.select} value={lc.category} onChange={(e) => store.run((d) => editLoadCase(d, { caseId: lc.id, category: e.target.value as LoadCategory }))}>
                  {loadCategories.map((cat) => (
                    <option key={cat} value={cat}>{cat}</option>
                  ))}
                </select>
              </td>
              <td className={`${c.td} text-center`}>
                <input type="checkbox" aria-label={`Case ${lc.name} pattern loading`} checked={lc.pattern} onChange={(e) => store.run((d) => editLoadCase(d, { caseId: lc.id, pattern: e.target.checked }))} />
              </td>
              <td className={`${c.td} tabular-nums text-paper-700`}>{lc.loads.length}</td>
              <td className={c.td}>
                <button type="button" className={c.smallButton} aria-label={`Delete case ${lc.name}`} onClick={() => store.run((d) => deleteLoadCase(d, { caseId: lc.id }))}>Delete</button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <button type="button" className={c.addButton} onClick={() => findAction("add-load-case").run(store)}>+ Load case</button>
    </div>
  );
}

