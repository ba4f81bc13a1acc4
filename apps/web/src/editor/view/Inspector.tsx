import type { ReactNode } from "react";
import { deleteLoad, editLoad } from "../commands/loadCommands";
import { deleteNode, moveNode, setSpringStiffness, setSupport, toggleHinge } from "../commands/nodeCommands";
import { editSegment, setSegmentLength } from "../commands/segmentCommands";
import { QuantityInput } from "../fields/QuantityInput";
import { findLoad, findNode, supportTypes, type Load } from "../model/BeamDocument";
import { useEditor, useEditorStore } from "../store/useEditor";
import { defaultSupport } from "../tools/placeSupport/placeSupportTool";
import { SectionButton } from "../design/SectionButton";
import { CheckInput, ChoiceInput } from "../fields/ChoiceInput";
import { useCanEdit } from "../store/useCanEdit";

function Field({ label, children }: { label: string; children: ReactNode }) {
  return (
    <label className="grid grid-cols-[6rem_1fr] items-center gap-2 text-sm">
      <span className="text-paper-700">{label}</span>
      {children}
    </label>
  );
}

const selectClass = "rounded-sm border border-paper-300 bg-white px-1 py-0.5 text-sm";
const deleteClass = "mt-2 rounded-sm border border-danger-200 px-2 py-1 text-xs text-danger-700 hover:bg-danger-50 disabled:opacity-50";
const supportChoices = (["none", ...supportTypes] as const).map((t) => ({ value: t, label: t }));

/** Exact fields for whatever is selected on the canvas or in a table. */
export function Inspector() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const selection = useEditor((s) => s.ui.selection);
  const u = doc.units;
  const run = store.run.bind(store);
  const readOnly = !useCanEdit();

  if (selection?.kind === "node") {
    const node = findNode(doc, selection.id);
    if (!node) return null;
    const index = doc.nodes.indexOf(node);
    const spring = node.support?.type === "spring" ? node.support : null;
    const setSpring = (stiffness: { ky?: number | null; kr?: number | null }) => run((d) => setSpringStiffness(d, { nodeId: node.id, ...stiffness }));
    return (
      <div className="space-y-2">
        <h3 className="text-sm font-semibold text-ink-900">Node {index + 1}</h3>
        <Field label="x"><QuantityInput readOnly={readOnly} label="Node x" value={node.x} kind="position" units={u} onCommit={(x) => run((d) => moveNode(d, { nodeId: node.id, x }))} /></Field>
        <Field label="Support">
          <ChoiceInput label="Support" className={selectClass} value={node.support?.type ?? "none"} choices={supportChoices} readOnly={readOnly}
            onChange={(t) => run((d) => setSupport(d, { nodeId: node.id, support: t === "none" ? null : defaultSupport(t) }))} />
        </Field>
        {spring && <Field label="ky"><QuantityInput readOnly={readOnly} label="Spring ky" value={spring.ky} kind="springK" units={u} onCommit={(ky) => setSpring({ ky })} onClear={() => setSpring({ ky: null })} /></Field>}
        {spring && <Field label="kr"><QuantityInput readOnly={readOnly} label="Spring kr" value={spring.kr} kind="springKr" units={u} onCommit={(kr) => setSpring({ kr })} onClear={() => setSpring({ kr: null })} /></Field>}
        <Field label="Hinge"><CheckInput label="Hinge" checked={node.hinge} readOnly={readOnly} onChange={() => run((d) => toggleHinge(d, { nodeId: node.id }))} /></Field>
        <button type="button" className={deleteClass} disabled={readOnly} onClick={() => run((d) => deleteNode(d, { nodeId: node.id }))}>Delete node</button>
      </div>
    );
  }

  if (selection?.kind === "segment") {
    const index = doc.segments.findIndex((s) => s.id === selection.id);
    const seg = doc.segments[index];
    if (!seg) return null;
    const length = doc.nodes[index + 1]!.x - doc.nodes[index]!.x;
    return (
      <div className="space-y-2">
        <h3 className="text-sm font-semibold text-ink-900">Segment {index + 1}</h3>
        <Field label="Length"><QuantityInput readOnly={readOnly} label="Length" value={length} kind="length" units={u} onCommit={(l) => run((d) => setSegmentLength(d, { segmentId: seg.id, length: l }))} /></Field>
        <div className="grid grid-cols-[6rem_1fr] items-center gap-2 text-sm">
          <span className="text-paper-700">Section</span>
          <SectionButton segmentId={seg.id} number={index + 1} className="rounded-sm border border-paper-300 px-2 py-0.5 text-left text-xs text-ink-800 hover:bg-paper-50" />
        </div>
        <Field label="E"><QuantityInput readOnly={readOnly} label="Modulus of elasticity E" value={seg.E} kind="modulus" units={u} onCommit={(E) => run((d) => editSegment(d, { segmentId: seg.id, props: { E } }))} /></Field>
        <Field label="I"><QuantityInput readOnly={readOnly} label="Second moment of area I" value={seg.I} kind="secondMoment" units={u} onCommit={(I) => run((d) => editSegment(d, { segmentId: seg.id, props: { I } }))} /></Field>
        {doc.theory === "timoshenko" && (
          <>
            <Field label="A"><QuantityInput readOnly={readOnly} label="Area A" value={seg.A} kind="area" units={u} onCommit={(A) => run((d) => editSegment(d, { segmentId: seg.id, props: { A } }))} /></Field>
            <Field label="G"><QuantityInput readOnly={readOnly} label="Shear modulus G" value={seg.G} kind="modulus" units={u} onCommit={(G) => run((d) => editSegment(d, { segmentId: seg.id, props: { G } }))} /></Field>
            <Field label="κ"><QuantityInput readOnly={readOnly} label="Shear correction factor" value={seg.shearFactor} kind="factor" units={u} onCommit={(k) => run((d) => editSegment(d, { segmentId: seg.id, props: { shearFactor: k } }))} /></Field>
          </>
        )}
      </div>
    );
  }

  if (selection?.kind === "load") {
    const found = findLoad(doc, selection.id);
    if (!found) return null;
    const { load, loadCase } = found;
    const edit = (next: Load) => run((d) => editLoad(d, { loadId: load.id, load: next }));
    return (
      <div className="space-y-2">
        <h3 className="text-sm font-semibold text-ink-900">{load.type[0]!.toUpperCase() + load.type.slice(1)} load</h3>
        <Field label="Case">
          <ChoiceInput label="Load case" className={selectClass} value={loadCase.id} readOnly={readOnly}
            choices={doc.loadCases.map((c) => ({ value: c.id, label: c.name }))} onChange={(caseId) => run((d) => editLoad(d, { loadId: load.id, load, caseId }))} />
        </Field>
        {load.type === "point" && (
          <>
            <Field label="x"><QuantityInput readOnly={readOnly} label="Load x" value={load.x} kind="position" units={u} onCommit={(x) => edit({ ...load, x })} /></Field>
            <Field label="Force (up +)"><QuantityInput readOnly={readOnly} label="Force" value={load.fy} kind="force" units={u} onCommit={(fy) => edit({ ...load, fy })} /></Field>
          </>
        )}
        {load.type === "moment" && (
          <>
            <Field label="x"><QuantityInput readOnly={readOnly} label="Moment x" value={load.x} kind="position" units={u} onCommit={(x) => edit({ ...load, x })} /></Field>
            <Field label="Moment (CCW +)"><QuantityInput readOnly={readOnly} label="Moment" value={load.mz} kind="moment" units={u} onCommit={(mz) => edit({ ...load, mz })} /></Field>
          </>
        )}
        {load.type === "distributed" && (
          <>
            <Field label="x1"><QuantityInput readOnly={readOnly} label="Start x1" value={load.x1} kind="position" units={u} onCommit={(x1) => edit({ ...load, x1 })} /></Field>
            <Field label="x2"><QuantityInput readOnly={readOnly} label="End x2" value={load.x2} kind="position" units={u} onCommit={(x2) => edit({ ...load, x2 })} /></Field>
            <Field label="q at x1 (up +)"><QuantityInput readOnly={readOnly} label="Intensity at x1" value={load.qy1} kind="distributed" units={u} onCommit={(qy1) => edit({ ...load, qy1 })} /></Field>
            <Field label="q at x2 (up +)"><QuantityInput readOnly={readOnly} label="Intensity at x2" value={load.qy2} kind="distributed" units={u} onCommit={(qy2) => edit({ ...load, qy2 })} /></Field>
          </>
        )}
        {load.type === "settlement" && (
          <Field label="Settlement (up +)"><QuantityInput readOnly={readOnly} label="Settlement" value={load.uy} kind="settlement" units={u} onCommit={(uy) => edit({ ...load, uy })} /></Field>
        )}
        <button type="button" className={deleteClass} disabled={readOnly} onClick={() => run((d) => deleteLoad(d, { loadId: load.id }))}>Delete load</button>
      </div>
    );
  }

  return (
    <p className="text-sm text-paper-600">
      {readOnly
        ? "Select a node, segment or load on the canvas or in a table to read its exact values. Your role can read this beam but not change it."
        : "Select a node, segment or load on the canvas or in a table to edit its exact values. Values accept units, e.g. “6500 mm”, “12'-6\"”, “2.5 kip/ft”."}
    </p>
  );
}
