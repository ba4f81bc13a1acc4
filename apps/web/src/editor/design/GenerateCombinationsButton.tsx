import { Suspense, useState } from "react";
import { useCanEdit } from "../store/useCanEdit";
import { GenerateDialog } from "./lazyDesign";

/** "Generate from code…": code-preset combinations for the load cases present, added in one undo step. */
export function GenerateCombinationsButton({ className }: { className?: string }) {
  const [open, setOpen] = useState(false);
  const canEdit = useCanEdit();
  return (
    <>
      <button type="button" className={className} disabled={!canEdit} onClick={() => setOpen(true)}>Generate from code…</button>
      {open && (
        <Suspense fallback={null}>
          <GenerateDialog onClose={() => setOpen(false)} />
        </Suspense>
      )}
    </>
  );
}
