/** Codes of the expected failures, as listed in the exchange format. */
export type SolverErrorCode = "invalid-model" | "mechanism" | "too-large";

/** An expected failure as a plain value: what the engine stages return instead of throwing. */
export interface SolverFailure {
  code: SolverErrorCode;
  message: string;
  /** A model path such as `segments[2].I`, or the free part of a mechanism (nodes or x range). */
  where: string;
}

/** A tiny ok/err result, so stages can report expected failures without exceptions. */
export type Result<T> = { ok: true; value: T } | { ok: false; error: SolverFailure };

export function ok<T>(value: T): Result<T> {
  return { ok: true, value };
}

export function fail<T = never>(code: SolverErrorCode, message: string, where: string): Result<T> {
  return { ok: false, error: { code, message, where } };
}

/** The one error `solve` throws for expected failures; `code` is one of the contract's codes. */
export class SolverError extends Error {
  readonly code: SolverErrorCode;
  readonly where: string;

  constructor(failure: SolverFailure) {
    super(failure.message);
    this.name = "SolverError";
    this.code = failure.code;
    this.where = failure.where;
  }

  /** The error object of the exchange format: `{ code, message, where }`. */
  toJSON(): SolverFailure {
    return { code: this.code, message: this.message, where: this.where };
  }
}

/** Unwraps a result, turning an expected failure into a thrown `SolverError`. */
export function unwrap<T>(result: Result<T>): T {
  if (result.ok) return result.value;
  throw new SolverError(result.error);
}
