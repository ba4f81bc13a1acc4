import type { ErrorCode } from "@spanwright/contracts";

/**
 * The one error type the API throws on purpose. Services pick a code; the error middleware maps it
 * to an HTTP status, so no service knows about HTTP.
 */
export class AppError extends Error {
  override readonly name = "AppError";
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export function notFound(what = "not found"): AppError {
  return new AppError("not-found", what);
}
