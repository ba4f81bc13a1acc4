import { useState } from "react";
import { Button } from "./Button";

/**
 * A destructive action that asks once, in place (no modal to trap focus in): the first press
 * reveals "confirm" and "cancel", the second performs it.
 */
export function ConfirmButton({
  label,
  confirmLabel,
  question,
  onConfirm,
  busy = false,
  disabled = false,
}: {
  label: string;
  confirmLabel: string;
  question: string;
  onConfirm: () => void;
  busy?: boolean;
  disabled?: boolean;
}) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button variant="ghost" size="sm" disabled={disabled} onClick={() => setAsking(true)}>
        {label}
      </Button>
    );
  }
  return (
    <span className="inline-flex items-center gap-2" role="group" aria-label={question}>
      <span className="text-sm text-danger-700">{question}</span>
      <Button
        variant="danger"
        size="sm"
        busy={busy}
        busyLabel="Working…"
        onClick={() => {
          onConfirm();
        }}
        autoFocus
      >
        {confirmLabel}
      </Button>
      <Button variant="secondary" size="sm" disabled={busy} onClick={() => setAsking(false)}>
        Cancel
      </Button>
    </span>
  );
}
