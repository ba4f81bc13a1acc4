import type { Revision } from "@spanwright/contracts";
import type { ExchangeModel } from "../model/exchange";
import { describeChanges } from "../persistence/describeChanges";
import type { UnitSystemId } from "../units/unitSystems";
import { Button } from "../../components/Button";

export interface SaveConflictDialogProps {
  readonly current: Revision;
  readonly mine: ExchangeModel;
  readonly units: UnitSystemId;
  readonly busy: boolean;
  readonly onReload: () => void;
  readonly onSaveAsNew: () => void;
  readonly onClose: () => void;
}

/** Someone saved first: show their revision and how mine differs, and never overwrite theirs. */
export function SaveConflictDialog({ current, mine, units, busy, onReload, onSaveAsNew, onClose }: SaveConflictDialogProps) {
  const differences = describeChanges(current.model as unknown as ExchangeModel, mine, units);
  return (
    <div role="dialog" aria-modal="true" aria-labelledby="conflict-title" className="fixed inset-0 z-50 flex items-center justify-center bg-black/40 p-4">
      <div className="max-h-[90vh] w-full max-w-lg overflow-y-auto rounded-lg bg-white p-5 shadow-card">
        <h2 id="conflict-title" className="text-lg font-semibold text-ink-900">Someone saved this beam first</h2>
        <p className="mt-1 text-sm text-paper-700">
          {current.author.name} saved revision r{current.version} at {new Date(current.createdAt).toLocaleString()}
          {current.changeSummary ? ` (“${current.changeSummary}”)` : ""}. Your changes were not saved, and theirs were not overwritten.
        </p>
        <h3 className="mt-3 text-sm font-semibold text-ink-900">Your version differs from r{current.version} in:</h3>
        {differences.length === 0 ? (
          <p className="text-sm text-paper-700">Nothing: both versions are the same model.</p>
        ) : (
          <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm text-paper-800">
            {differences.slice(0, 30).map((d) => <li key={d}>{d}</li>)}
            {differences.length > 30 && <li>… and {differences.length - 30} more</li>}
          </ul>
        )}
        <div className="mt-4 flex flex-wrap justify-end gap-2">
          <Button variant="ghost" onClick={onClose} disabled={busy}>Keep editing</Button>
          <Button variant="secondary" onClick={onReload} disabled={busy}>Load r{current.version} (discard mine)</Button>
          <Button variant="primary" onClick={onSaveAsNew} busy={busy} busyLabel="Saving…">Save mine as a new beam</Button>
        </div>
      </div>
    </div>
  );
}
