import { QuantityInput } from "../fields/QuantityInput";
import { useEditor, useEditorStore } from "../store/useEditor";

/** The snapping grid step; accepts any length ("0.1 m", "3 in"). Zero turns snapping to the grid off. */
export function GridStepField() {
  const store = useEditorStore();
  const step = useEditor((s) => s.ui.gridStep);
  const units = useEditor((s) => s.history.doc.units);
  return (
    <label className="flex items-center gap-1 text-xs">
      <span className="text-paper-600">Grid</span>
      <QuantityInput
        className="w-28"
        label="Grid step"
        value={step}
        kind="position"
        units={units}
        onCommit={(si) => {
          if (!(si >= 0)) return false;
          store.setUi({ gridStep: si });
        }}
      />
    </label>
  );
}
