import { useEffect, useId, useRef, type ReactNode } from "react";
import { createPortal } from "react-dom";

export interface EditorDialogProps {
  readonly title: string;
  readonly onClose: () => void;
  readonly children: ReactNode;
}

/**
 * A modal over the editor. Keys typed inside stay inside (the editor's window shortcuts would
 * otherwise delete the selection or undo while the user types a flange width); Escape closes and
 * focus goes back to the button that opened it.
 */
export function EditorDialog({ title, onClose, children }: EditorDialogProps) {
  const titleId = useId();
  const panel = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    panel.current?.focus();
    return () => opener?.focus();
  }, []);
  // A portal keeps the dialog out of the table row or label that opened it (valid DOM, no label
  // activation); React events still bubble to the opener's handlers, hence stopPropagation.
  return createPortal(
    <div
      role="dialog"
      aria-modal="true"
      aria-labelledby={titleId}
      className="fixed inset-0 z-50 flex items-center justify-center bg-black/40 p-4"
      onKeyDown={(e) => {
        e.stopPropagation();
        if (e.key === "Escape") onClose();
      }}
    >
      <div ref={panel} tabIndex={-1} className="max-h-[90vh] w-full max-w-4xl overflow-y-auto rounded-lg bg-white p-5 shadow-card outline-none">
        <div className="mb-3 flex items-start justify-between gap-4">
          <h2 id={titleId} className="text-lg font-semibold text-ink-900">{title}</h2>
          <button type="button" className="rounded-sm px-2 py-0.5 text-sm text-paper-700 hover:bg-paper-200" onClick={onClose}>
            Close
          </button>
        </div>
        {children}
      </div>
    </div>,
    document.body,
  );
}
