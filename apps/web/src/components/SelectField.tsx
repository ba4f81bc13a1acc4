import { useId, type SelectHTMLAttributes } from "react";
import { asSentence, fieldClasses } from "./fieldClasses";

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, "id"> {
  label: string;
  name: string;
  options: readonly SelectOption[];
  error?: string | undefined;
  /** Hide the label visually (e.g. inside a table row) while keeping it for screen readers. */
  labelHidden?: boolean;
}

export function SelectField({ label, name, options, error, labelHidden, className, ...rest }: SelectFieldProps) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <div className={className}>
      <label
        htmlFor={id}
        className={labelHidden === true ? "sr-only" : "mb-1 block text-sm font-medium text-ink-800"}
      >
        {label}
      </label>
      <div className="relative">
        <select
          id={id}
          name={name}
          className={`${fieldClasses(error !== undefined)} appearance-none pr-9`}
          aria-invalid={error !== undefined || undefined}
          aria-describedby={error !== undefined ? errorId : undefined}
          {...rest}
        >
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        {/* The native arrow is replaced so selects match inputs in every browser. */}
        <span
          aria-hidden="true"
          className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-xs text-paper-600"
        >
          ▾
        </span>
      </div>
      {error !== undefined && (
        <p id={errorId} className="mt-1 text-sm font-medium text-danger-700">
          {asSentence(error)}
        </p>
      )}
    </div>
  );
}
