import { useId, useState } from "react";
import { describeError, isApiError } from "../api/client";
import { useCheckRevision } from "../api/revisions";
import { Button } from "../components/Button";

/** The checker's action: an optional comment, then "mark checked". A checked revision is immutable. */
export function CheckRevisionForm({ projectId, beamId, version }: { projectId: string; beamId: string; version: number }) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [comment, setComment] = useState("");
  const check = useCheckRevision(projectId, beamId);
  if (!open) {
    return (
      <Button variant="secondary" size="sm" onClick={() => setOpen(true)}>
        Mark checked
      </Button>
    );
  }
  return (
    <form
      className="mt-2 space-y-2"
      onSubmit={(e) => {
        e.preventDefault();
        const trimmed = comment.trim();
        check.mutate({ version, ...(trimmed !== "" ? { comment: trimmed } : {}) });
      }}
    >
      <label htmlFor={id} className="block text-xs font-medium text-ink-800">{`Checker's comment on r${version} (optional)`}</label>
      <textarea
        id={id}
        rows={2}
        maxLength={2000}
        value={comment}
        onChange={(e) => setComment(e.target.value)}
        className="block w-full min-w-[16rem] rounded-md border border-paper-300 bg-white px-2 py-1 text-sm"
      />
      {check.isError && (
        <p role="alert" className="text-sm font-medium text-danger-700">
          {isApiError(check.error) && check.error.code === "already-checked" ? "This revision is already checked." : describeError(check.error)}
        </p>
      )}
      <div className="flex gap-2">
        <Button type="submit" size="sm" busy={check.isPending} busyLabel="Saving…">{`Mark r${version} checked`}</Button>
        <Button variant="ghost" size="sm" onClick={() => setOpen(false)}>Cancel</Button>
      </div>
    </form>
  );
}
