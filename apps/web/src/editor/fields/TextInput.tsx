import { useEffect, useState, type KeyboardEvent } from "react";

/** A plain text cell (names) that commits on Enter or blur and reverts on Escape. */
export function TextInput({
  value,
  onCommit,
  label,
  onKeyDown,
  readOnly = false,
}: {
  readonly value: string;
  readonly onCommit: (text: string) => boolean | void;
  readonly label: string;
  readonly onKeyDown?: (e: KeyboardEvent<HTMLInputElement>) => void;
  /** Shown and focusable but never committed. */
  readonly readOnly?: boolean;
}) {
  const [text, setText] = useState(value);
  useEffect(() => setText(value), [value]);
  const commit = () => {
    if (!readOnly && text !== value && onCommit(text) === false) setText(value);
  };
  return (
    <input
      aria-label={label}
      className="w-full min-w-0 rounded-sm border border-paper-300 bg-white px-1.5 py-0.5 text-sm focus:outline-2 focus:outline-ochre-400"
      value={text}
      readOnly={readOnly}
      data-pending={text !== value}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === "Enter") commit();
        if (e.key === "Escape") setText(value);
        onKeyDown?.(e);
      }}
    />
  );
}
