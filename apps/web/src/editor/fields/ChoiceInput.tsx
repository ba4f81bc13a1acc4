export interface Choice<T extends string> {
  readonly value: T;
  readonly label: string;
}

export interface ChoiceInputProps<T extends string> {
  readonly label: string;
  readonly value: T;
  readonly choices: readonly Choice<T>[];
  readonly onChange: (value: T) => void;
  readonly className: string;
  /**
   * Shows the chosen label in a read-only text field instead of a select: a disabled select would
   * leave the tab order, and read-only cells must stay reachable from the keyboard.
   */
  readonly readOnly?: boolean;
}

/** A select for an editable beam, a focusable read-only field otherwise. */
export function ChoiceInput<T extends string>({ label, value, choices, onChange, className, readOnly = false }: ChoiceInputProps<T>) {
  if (readOnly) {
    const shown = choices.find((c) => c.value === value)?.label ?? value;
    return <input aria-label={label} className={`${className} bg-paper-50`} value={shown} readOnly />;
  }
  return (
    <select aria-label={label} className={className} value={value} onChange={(e) => onChange(e.target.value as T)}>
      {choices.map((c) => (
        <option key={c.value} value={c.value}>{c.label}</option>
      ))}
    </select>
  );
}

export interface CheckInputProps {
  readonly label: string;
  readonly checked: boolean;
  readonly onChange: (checked: boolean) => void;
  /** Focusable but not toggled (aria-readonly), for the same reason as ChoiceInput. */
  readonly readOnly?: boolean;
}

export function CheckInput({ label, checked, onChange, readOnly = false }: CheckInputProps) {
  return (
    <input
      type="checkbox"
      aria-label={label}
      aria-readonly={readOnly || undefined}
      checked={checked}
      onClick={readOnly ? (e) => e.preventDefault() : undefined}
      onChange={(e) => {
        if (!readOnly) onChange(e.target.checked);
      }}
    />
  );
}
