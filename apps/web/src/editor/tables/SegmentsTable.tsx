import { splitSpan } from "../commands/nodeCommands";
import { editSegment, setSegmentLength, type SectionProperties } from "../commands/segmentCommands";
import { QuantityInput } from "../fields/QuantityInput";
import { snapToGrid } from "../geometry/snapping";
import type { QuantityKind } from "../units/unitSystems";
import { useEditor, useEditorStore } from "../store/useEditor";
import { navigateGrid, tableClasses as c } from "./gridNavigation";
import { SectionButton } from "../design/SectionButton";
import { useCanEdit } from "../store/useCanEdit";

const columns: readonly { key: keyof SectionProperties; label: string; kind: QuantityKind; optional: boolean }[] = [
  { key: "E", label: "E", kind: "modulus", optional: false },
  { key: "I", label: "I", kind: "secondMoment", optional: false },
  { key: "A", label: "A", kind: "area", optional: true },
  { key: "G", label: "G", kind: "modulus", optional: true },
  { key: "shearFactor", label: "κ", kind: "factor", optional: true },
];

/** Segments with length, section and material; A, G and κ only matter for Timoshenko theory. */
export function SegmentsTable() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const selection = useEditor((s) => s.ui.selection);
  const gridStep = useEditor((s) => s.ui.gridStep);
  const units = doc.units;
  const readOnly = !useCanEdit();
  return (
    <table className={c.table} onKeyDown={navigateGrid}>
      <thead className={c.head}>
        <tr>
          <th className={c.th}>Segment</th>
          <th className={c.th}>Length</th>
          <th className={c.th}>Section</th>
          {columns.map((col) => (
            <th key={col.key} className={c.th} title={col.optional ? "Needed for Timoshenko theory only" : undefined}>{col.label}</th>
          ))}
          <th className={c.th}><span className="sr-only">Actions</span></th>
        </tr>
      </thead>
      <tbody>
        {doc.segments.map((s, i) => {
          const a = doc.nodes[i]!.x;
          const b = doc.nodes[i + 1]!.x;
          return (
            <tr key={s.id} className={c.row(selection?.kind === "segment" && selection.id === s.id)} onFocus={() => store.setUi({ selection: { kind: "segment", id: s.id } })}>
              <td className={`${c.td} text-paper-600`}>{i + 1}</td>
              <td className={c.td}>
                <QuantityInput label={`Segment ${i + 1} length`} value={b - a} kind="length" units={units} readOnly={readOnly} onCommit={(length) => store.run((d) => setSegmentLength(d, { segmentId: s.id, length }))} />
              </td>
              <td className={c.td}>
                <SectionButton segmentId={s.id} number={i + 1} className={c.smallButton} />
              </td>
              {columns.map((col) => (
                <td key={col.key} className={c.td}>
                  <QuantityInput
                    label={`Segment ${i + 1} ${col.label}`}
                    value={s[col.key]}
                    kind={col.kind}
                    units={units}
                    readOnly={readOnly}
                    onCommit={(v) => store.run((d) => editSegment(d, { segmentId: s.id, props: { [col.key]: v } }))}
                    {...(col.optional ? { onClear: () => store.run((d) => editSegment(d, { segmentId: s.id, props: { [col.key]: undefined } })) } : {})}
                  />
                </td>
              ))}
              <td className={c.td}>
                <button type="button" className={c.smallButton} aria-label={`Split segment ${i + 1} at its middle`} disabled={readOnly} onClick={() => store.run((d) => splitSpan(d, { segmentId: s.id, x: snapToGrid((a + b) / 2, gridStep) }))}>
                  Split
                </button>
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
