import { useEffect, useState, type KeyboardEvent } from "react";
import { parseQuantity } from "../units/parseQuantity";
import { formatEditable } from "../units/formatQuantity";
import { displayUnitLabel, type QuantityKind, type UnitSystemId } from "../units/unitSystems";

export interface QuantityInputProps {
  readonly value: number | undefined;
  readonly kind: QuantityKind;
  readonly units: UnitSystemId;
  /** Receives the SI value; returns false when the edit was refused (the field then reverts). */
  readonly onCommit: (si: number) => boolean | void;
  /** Lets an optional value be cleared by emptying the field. */
  readonly onClear?: () => void;
  readonly label: string;
  readonly className?: string;
  readonly id?: string;
  /** Extra key handling (table navigation) after the field's own. */
  readonly onKeyDown?: (e: KeyboardEvent<HTMLInputElement>) => void;
  /** Shown and focusable (so tables stay keyboard-navigable) but never committed. */
  readonly readOnly?: boolean;
}

/**
 * A text field for one quantity in display units. Accepts any unit of the right dimension
 * ("6500 mm" in a metre field) and feet-inches; commits on Enter or blur, Escape reverts.
 */
export function QuantityInput({ value, kind, units, onCommit, onClear, label, className, id, onKeyDown, readOnly = false }: QuantityInputProps) {
  const shown = value === undefined ? "" : formatEditable(value, units, kind);
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setText(shown);
    setError(null);
  }, [shown]);

  const commit = () => {
    if (readOnly || text === shown) return;
    if (text.trim() === "" && onClear) {
      onClear();
      return;
    }
    const parsed = parseQuantity(text, kind, units);
    if (!parsed.ok) {
      setError(parsed.error.message);
      return;
    }
    setError(null);
    if (onCommit(parsed.value) === false) setText(shown);
  };

  const unit = displayUnitLabel(units, kind);
  return (
    <span className={`inline-flex items-center gap-1 ${className ?? ""}`}>
      <input
        id={id}
        aria-label={unit ? `${label} (${unit})` : label}
        aria-invalid={error !== null}
        title={error ?? undefined}
        className={`w-full min-w-0 rounded-sm border px-1.5 py-0.5 text-right font-mono text-sm tabular-nums focus:outline-2 focus:outline-ochre-400 ${
          error ? "border-danger-600 bg-danger-50" : readOnly ? "border-paper-200 bg-paper-50" : "border-paper-300 bg-white"
        }`}
        value={text}
        readOnly={readOnly}
        data-pending={text !== shown}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === "Enter") commit();
          if (e.key === "Escape") {
            setText(shown);
            setError(null);
          }
          onKeyDown?.(e);
        }}
      />
      {unit && <span className="shrink-0 text-xs text-paper-600">{unit}</span>}
    </span>
  );
}
