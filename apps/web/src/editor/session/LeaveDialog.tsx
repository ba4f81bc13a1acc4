import type { Blocker } from "react-router";
import { Button } from "../../components/Button";

/** Shown when in-app navigation is blocked by unsaved changes. */
export function LeaveDialog({ blocker }: { blocker: Blocker }) {
  if (blocker.state !== "blocked") return null;
  return (
    <div role="alertdialog" aria-modal="true" aria-labelledby="leave-title" className="fixed inset-0 z-50 flex items-center justify-center bg-black/40 p-4">
      <div className="w-full max-w-md rounded-lg bg-white p-5 shadow-card">
        <h2 id="leave-title" className="text-lg font-semibold text-ink-900">Leave without saving?</h2>
        <p className="mt-1 text-sm text-paper-700">Your unsaved changes stay in this browser as a draft and will be offered back when you return to this beam.</p>
        <div className="mt-4 flex justify-end gap-2">
          <Button variant="secondary" onClick={() => blocker.reset()} autoFocus>Stay</Button>
          <Button variant="danger" onClick={() => blocker.proceed()}>Leave</Button>
        </div>
      </div>
    </div>
  );
}
