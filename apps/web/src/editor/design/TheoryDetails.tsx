import { useMemo } from "react";
import { sectionProperties } from "@spanwright/solver/design";
import { TheoryPanel } from "../../design";
import { setTheory } from "../commands/documentCommands";
import { toExchange } from "../model/exchange";
import { useEditor, useEditorStore } from "../store/useEditor";
import { beamSection } from "./beamSection";
import { useCanEdit } from "../store/useCanEdit";

/** The inside of TheorySettings, loaded when it is first opened (see lazyDesign.ts). */
export function TheoryDetails() {
  const store = useEditorStore();
  const doc = useEditor((s) => s.history.doc);
  const { nodes, segments, loadCases, combinations, theory, stations } = doc;
  const model = useMemo(
    () => toExchange({ title: "", units: "si", nodes, segments, loadCases, combinations, theory, stations }),
    [nodes, segments, loadCases, combinations, theory, stations],
  );
  const canEdit = useCanEdit();
  const chosen = beamSection(doc);
  const props = chosen ? sectionProperties(chosen.section.shape) : null;
  const G = chosen?.section.material.G;
  return (
    <>
      <TheoryPanel
        model={model}
        theory={theory}
        units={doc.units}
        {...(canEdit ? { onTheoryChange: (t: typeof theory) => store.run((d) => setTheory(d, { theory: t })) } : {})}
        {...(props?.ok ? { depth: props.value.depth } : {})}
        fallback={{ ...(G !== undefined ? { G } : {}), shearArea: props?.ok ? props.value.shearArea : null }}
      />
      {!chosen && <p className="mt-1 text-xs text-paper-600">The span-to-depth hint needs a section: “Section…” in the Segments table.</p>}
    </>
  );
}
