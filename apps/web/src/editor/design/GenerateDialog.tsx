import { useMemo } from "react";
import { CombinationGenerator } from "../../design";
import { addCombinations } from "../commands/designCommands";
import { useEditor, useEditorStore } from "../store/useEditor";
import { EditorDialog } from "./EditorDialog";

/** The dialog of GenerateCombinationsButton (its own chunk: see lazyDesign.ts). */
export function GenerateDialog({ onClose }: { onClose: () => void }) {
  const store = useEditorStore();
  const loadCases = useEditor((s) => s.history.doc.loadCases);
  const combinations = useEditor((s) => s.history.doc.combinations);
  const cases = useMemo(() => loadCases.map((c) => ({ id: c.name, category: c.category })), [loadCases]);
  // Case and combination names share one namespace in the exchange format.
  const takenIds = useMemo(() => [...loadCases.map((c) => c.name), ...combinations.map((k) => k.name)], [loadCases, combinations]);
  return (
    <EditorDialog title="Generate load combinations from a code preset" onClose={onClose}>
      <CombinationGenerator
        cases={cases}
        takenIds={takenIds}
        onApply={(generated) => {
          if (store.run((d) => addCombinations(d, { combinations: generated }))) onClose();
        }}
      />
    </EditorDialog>
  );
}
