import { useId, type InputHTMLAttributes } from "react";
import { asSentence, fieldClasses } from "./fieldClasses";

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "id"> {
  label: string;
  name: string;
  error?: string | undefined;
  hint?: string;
}

/** A labelled input whose error is announced and tied to it through aria-describedby. */
export function TextField({ label, name, error, hint, className, ...rest }: TextFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint !== undefined ? hintId : null, error !== undefined ? errorId : null]
    .filter((v) => v !== null)
    .join(" ");
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block text-sm font-medium text-ink-800">
        {label}
      </label>
      <input
        id={id}
        name={name}
        className={fieldClasses(error !== undefined)}
        aria-invalid={error !== undefined || undefined}
        aria-describedby={describedBy === "" ? undefined : describedBy}
        {...rest}
      />
      {hint !== undefined && (
        <p id={hintId} className="mt-1 text-xs text-paper-600">
          {hint}
        </p>
      )}
      {error !== undefined && (
        <p id={errorId} className="mt-1 text-sm font-medium text-danger-700">
          {asSentence(error)}
        </p>
      )}
    </div>
  );
}
