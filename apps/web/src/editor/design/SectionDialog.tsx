import { useState } from "react";
import { useParams } from "react-router";
import { findMaterialPreset, MATERIAL_PRESETS, type Material, type SectionShape } from "@spanwright/solver/design";
import { MaterialPicker, SectionEditor } from "../../design";
import { DEFAULT_SHAPES } from "../../design/shapeFields";
import { Button } from "../../components/Button";
import { setSegmentSection } from "../commands/designCommands";
import type { SegmentId } from "../model/ids";
import { useEditor, useEditorStore } from "../store/useEditor";
import { EditorDialog } from "./EditorDialog";
import { useCanEdit } from "../store/useCanEdit";
import { ProjectSectionLibrary } from "./ProjectSectionLibrary";

/** The dialog of SectionButton (its own chunk, with the design components: see lazyDesign.ts). */
export function SectionDialog({ segmentId, number, onClose }: { segmentId: SegmentId; number: number; onClose: () => void }) {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const current = doc.segments.find((g) => g.id === segmentId)?.section;
  const [shape, setShape] = useState<SectionShape>(current?.shape ?? DEFAULT_SHAPES["i-shape"]);
  const [material, setMaterial] = useState<Material>(current?.material ?? findMaterialPreset("steel-a992") ?? MATERIAL_PRESETS[0]!);
  const [problem, setProblem] = useState<string | null>(null);
  const canEdit = useCanEdit();
  const { projectId } = useParams();
  // The pickers own their text once mounted; a picked library section remounts them with its values.
  const [picked, setPicked] = useState(0);
  const pick = (nextShape: SectionShape, nextMaterial: Material) => {
    setShape(nextShape);
    setMaterial(nextMaterial);
    setProblem(null);
    setPicked((n) => n + 1);
  };
  // Refusals show here: the editor's notice bar sits behind the dialog.
  const apply = (segmentIds: readonly SegmentId[]) => {
    const result = setSegmentSection(store.doc, { segmentIds, shape, material });
    if (!result.ok) return setProblem(result.error.message);
    if (store.run(() => result)) onClose();
  };
  return (
    <EditorDialog title={`Section and material: segment ${number}`} onClose={onClose}>
      <div className="space-y-5">
        {projectId && <ProjectSectionLibrary projectId={projectId} shape={shape} material={material} canSave={canEdit} onPick={pick} />}
        <MaterialPicker key={`material-${picked}`} units={doc.units} initial={material} onChange={setMaterial} />
        <SectionEditor key={`shape-${picked}`} units={doc.units} initialShape={shape} material={material} theory={doc.theory} onChange={(c) => setShape(c.shape)} />
        <p className="text-xs text-paper-600">
          Sets E, I (and A, G, κ where the material has G) of the segment. The revision saves those values; the shape and material
          themselves stay with this editing session only.
        </p>
        {problem && <p role="alert" className="text-sm font-medium text-danger-700">{problem}</p>}
        {!canEdit && <p className="text-sm text-paper-700">Your role can read sections but not apply them to the beam.</p>}
        <div className="flex flex-wrap justify-end gap-2">
          <Button variant="secondary" disabled={!canEdit} onClick={() => apply(doc.segments.map((g) => g.id))}>Apply to all {doc.segments.length} segments</Button>
          <Button variant="primary" disabled={!canEdit} onClick={() => apply([segmentId])}>Apply to segment {number}</Button>
        </div>
      </div>
    </EditorDialog>
  );
}
