/**
 * Expected failures in the design functions are values, not throws (house style rule 5):
 * the caller shows `message` beside the field named by `field`.
 */
export type DesignErrorCode = "invalid-input";

export interface DesignError {
  readonly code: DesignErrorCode;
  readonly message: string;
  /** Dotted path of the offending field, e.g. `tf` or `flange.width`. */
  readonly field: string;
}

export type DesignResult<T> =
  | { readonly ok: true; readonly value: T }
  | { readonly ok: false; readonly error: DesignError };

export function ok<T>(value: T): DesignResult<T> {
  return { ok: true, value };
}

export function invalid<T>(field: string, message: string): DesignResult<T> {
  return { ok: false, error: { code: "invalid-input", field, message } };
}

/** Zod issues carry a path; the first issue names the field the user must fix. */
export function fromZodIssues<T>(
  issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }>,
): DesignResult<T> {
  const first = issues[0];
  const field = first ? first.path.map(String).join(".") : "";
  return invalid(field, first?.message ?? "invalid input");
}

/** For exhaustive switches over discriminated unions (house style rule 23). */
export function exhaustive(value: never): never {
  throw new Error(`unhandled variant: ${JSON.stringify(value)}`);
}
