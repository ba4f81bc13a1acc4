import { useEffect, useId, useRef, useState } from "react";
import type { Handoff, HandoffRecipient } from "@spanwright/contracts";
import { describeError, isApiError } from "../api/client";
import { useCreateHandoff } from "../api/handoffs";
import { useMembers } from "../api/members";
import { Alert } from "../components/Alert";
import { Button } from "../components/Button";
import { Caution } from "../components/Caution";
import { asSentence } from "../components/fieldClasses";
import { Loading } from "../components/QueryState";
import { draftFromRecipients, eligibleMembers, validateRecipients, type RecipientDraft, type RecipientFormErrors } from "./recipientForm";

/**
 * Issues one revision's reaction table (CSV and PDF by e-mail) to viewers and external addresses.
 * A modal panel: Escape or "Close" dismisses it, focus starts on the first field.
 */
export function HandoffDialog({
  projectId,
  beamId,
  beamName,
  version,
  initialRecipients = [],
  onClose,
}: {
  projectId: string;
  beamId: string;
  beamName: string;
  version: number;
  initialRecipients?: readonly HandoffRecipient[];
  onClose: () => void;
}) {
  const titleId = useId();
  const members = useMembers(projectId);
  const send = useCreateHandoff(projectId, beamId);
  const [draft, setDraft] = useState<RecipientDraft | null>(null);
  const [errors, setErrors] = useState<RecipientFormErrors>({});
  const [sent, setSent] = useState<Handoff | null>(null);
  const panel = useRef<HTMLDivElement>(null);

  // The draft waits for the member list, so a re-issue can tick the earlier viewers.
  useEffect(() => {
    if (draft === null && members.isSuccess) setDraft(draftFromRecipients(initialRecipients, members.data));
  }, [draft, members.isSuccess, members.data, initialRecipients]);

  // Escape closes; the latest onClose is read through a ref so a parent re-render never re-binds.
  const closeRef = useRef(onClose);
  closeRef.current = onClose;
  useEffect(() => {
    // Focus goes back where it was (the "Issue" button) when the dialog closes.
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") closeRef.current();
      if (e.key === "Tab") trapTab(e, panel.current);
    };
    window.addEventListener("keydown", onKey);
    return () => {
      window.removeEventListener("keydown", onKey);
      opener?.focus();
    };
  }, []);

  const ready = draft !== null;
  useEffect(() => {
    panel.current?.querySelector<HTMLElement>("input, textarea, button")?.focus();
  }, [ready]);

  const viewers = members.isSuccess ? eligibleMembers(members.data) : [];

  const submit = () => {
    if (draft === null || !members.isSuccess) return;
    const result = validateRecipients(draft, members.data);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    send.mutate({ version, ...result.request }, { onSuccess: setSent });
  };

  return (
    <div className="fixed inset-0 z-40 flex items-start justify-center overflow-y-auto bg-ink-950/40 p-6">
      <div ref={panel} role="dialog" aria-modal="true" aria-labelledby={titleId} className="on-light w-full max-w-lg rounded-lg bg-white shadow-card">
        <header className="border-b border-paper-200 px-5 py-3">
          <h2 id={titleId} className="text-base font-semibold text-ink-900">{`Issue ${beamName}, r${version}`}</h2>
          <p className="text-xs text-paper-600">The reaction table (CSV) and the calculation report (PDF) go by e-mail with a link to this revision.</p>
        </header>
        <div className="space-y-4 px-5 py-4">
          {sent !== null ? (
            <Alert tone="success" title="Hand-off sent">
              <p>{`Sent r${sent.version} to ${sent.recipients.map((r) => r.name ?? r.email).join(", ")}.`}</p>
              <p className="mt-1 break-all text-xs">{`Message id: ${sent.messageId}`}</p>
            </Alert>
          ) : members.isPending || draft === null ? (
            <Loading label="Loading members…" />
          ) : (
            <form
              noValidate
              className="space-y-4"
              onSubmit={(e) => {
                e.preventDefault();
                submit();
              }}
            >
              <fieldset aria-describedby={errors.recipients !== undefined ? `${titleId}-rec` : undefined}>
                <legend className="mb-1 text-sm font-medium text-ink-800">Viewers in this project</legend>
                {viewers.length === 0 && <p className="text-sm text-paper-600">No member has the viewer role; type addresses below.</p>}
                {viewers.map((m) => (
                  <label key={m.userId} className="flex items-center gap-2 py-0.5 text-sm">
                    <input
                      type="checkbox"
                      checked={draft.memberIds.includes(m.userId)}
                      onChange={(e) =>
                        setDraft({
                          ...draft,
                          memberIds: e.target.checked ? [...draft.memberIds, m.userId] : draft.memberIds.filter((id) => id !== m.userId),
                        })
                      }
                    />
                    {`${m.name} <${m.email}>${m.pending ? " (invited)" : ""}`}
                  </label>
                ))}
                {errors.recipients !== undefined && (
                  <p id={`${titleId}-rec`} className="mt-1 text-sm font-medium text-danger-700">{errors.recipients}</p>
                )}
              </fieldset>
              <TextArea
                label="Other e-mail addresses"
                hint="Separate addresses with commas or new lines."
                value={draft.emails}
                rows={2}
                error={errors.emails}
                onChange={(emails) => setDraft({ ...draft, emails })}
              />
              <TextArea
                label="Message (optional)"
                value={draft.message}
                rows={3}
                error={errors.message}
                onChange={(message) => setDraft({ ...draft, message })}
              />
              {send.isError && (
                <Alert tone="error" title="Not sent">
                  {isApiError(send.error) && send.error.code === "mail-failed"
                    ? "The mail server did not accept the message; nothing was recorded. Try again shortly."
                    : describeError(send.error)}
                </Alert>
              )}
              <Caution />
              <div className="flex justify-end gap-2">
                <Button variant="ghost" onClick={onClose}>Cancel</Button>
                <Button type="submit" variant="accent" busy={send.isPending} busyLabel="Sending…">Send hand-off</Button>
              </div>
            </form>
          )}
          {sent !== null && (
            <div className="flex justify-end">
              <Button variant="secondary" onClick={onClose}>Close</Button>
            </div>
          )}
        </div>
      </div>
    </div>
  );
}

/** Keeps Tab and Shift+Tab inside the modal panel, wrapping at either end. */
function trapTab(e: KeyboardEvent, container: HTMLElement | null): void {
  if (container === null) return;
  const focusable = [...container.querySelectorAll<HTMLElement>("input, textarea, button, select, a[href]")].filter(
    (el) => !el.hasAttribute("disabled"),
  );
  const first = focusable[0];
  const last = focusable[focusable.length - 1];
  if (first === undefined || last === undefined) return;
  if (e.shiftKey && document.activeElement === first) {
    e.preventDefault();
    last.focus();
  } else if (!e.shiftKey && document.activeElement === last) {
    e.preventDefault();
    first.focus();
  }
}

function TextArea({ label, hint, value, rows, error, onChange }: {
  label: string;
  hint?: string;
  value: string;
  rows: number;
  error: string | undefined;
  onChange: (value: string) => void;
}) {
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-medium text-ink-800">{label}</label>
      <textarea
        id={id}
        rows={rows}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        aria-invalid={error !== undefined || undefined}
        aria-describedby={error !== undefined ? `${id}-error` : hint !== undefined ? `${id}-hint` : undefined}
        className={`block w-full rounded-md border bg-white px-3 py-2 text-sm ${error !== undefined ? "border-2 border-danger-600" : "border-paper-300"}`}
      />
      {hint !== undefined && <p id={`${id}-hint`} className="mt-1 text-xs text-paper-600">{hint}</p>}
      {error !== undefined && <p id={`${id}-error`} className="mt-1 text-sm font-medium text-danger-700">{asSentence(error)}</p>}
    </div>
  );
}
