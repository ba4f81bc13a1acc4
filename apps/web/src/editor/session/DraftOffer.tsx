import type { Draft } from "../persistence/draftStorage";
import { Button } from "../../components/Button";

/** Unsaved work from an earlier visit (a crash, a closed tab), offered back once. */
export function DraftOffer({ draft, currentVersion, onRestore, onDiscard }: { draft: Draft; currentVersion: number; onRestore: () => void; onDiscard: () => void }) {
  const stale = draft.baseVersion !== currentVersion;
  return (
    <div role="status" className="flex flex-wrap items-center gap-3 rounded-md border-l-4 border-ochre-500 bg-caution-50 px-3 py-2 text-sm text-caution-700">
      <span>
        Unsaved changes from {new Date(draft.savedAt).toLocaleString()} were kept in this browser.
        {stale ? ` They were made on r${draft.baseVersion}; the beam is now at r${currentVersion}, so restoring them replaces the newer model in the editor (nothing is saved until you save).` : ""}
      </span>
      <span className="ml-auto flex gap-2">
        <Button size="sm" variant="primary" onClick={onRestore}>Restore them</Button>
        <Button size="sm" variant="ghost" onClick={onDiscard}>Discard</Button>
      </span>
    </div>
  );
}
