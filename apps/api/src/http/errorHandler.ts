import { errorStatus, type ErrorBody } from "@spanwright/contracts";
import type { ErrorRequestHandler, RequestHandler } from "express";
import { AppError } from "./appError.js";
import { isDatabaseUnavailable } from "./dbErrors.js";

interface BodyParserError {
  type?: string;
  status?: number;
}

function toAppError(error: unknown): AppError | null {
  if (error instanceof AppError) return error;
  const bp = error as BodyParserError;
  if (bp && typeof bp === "object" && typeof bp.type === "string") {
    if (bp.type === "entity.too.large") return new AppError("too-large", "the request body is over 1 MB");
    if (bp.type === "entity.parse.failed") return new AppError("invalid-request", "the body is not valid JSON");
    if (bp.status && bp.status >= 400 && bp.status < 500) return new AppError("invalid-request", "malformed request");
  }
  if (isDatabaseUnavailable(error)) {
    return new AppError("database-unavailable", "the database is not reachable; try again shortly");
  }
  return null;
}

/** Maps every error to `{ error: { code, message, details } }`; unknown errors are logged, never shown. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const known = toAppError(error);
  const appError = known ?? new AppError("internal", "something went wrong on the server");
  if (!known) req.log?.error({ err: error }, "unhandled error");
  // a body over the byte limit is 413; a model over the element limits is 422 (see contracts)
  const status =
    appError.code === "too-large" && (error as BodyParserError).type === "entity.too.large"
      ? 413
      : errorStatus[appError.code];
  const where = appError.details?.where;
  const body: ErrorBody = {
    error: {
      code: appError.code,
      message: appError.message,
      ...(typeof where === "string" ? { where } : {}),
      ...(appError.details ? { details: appError.details } : {}),
    },
  };
  const retryAfter = appError.details?.retryAfterSeconds;
  if (typeof retryAfter === "number") res.setHeader("Retry-After", String(retryAfter));
  res.status(status).json(body);
};

export const apiNotFound: RequestHandler = (_req, _res, next) => {
  next(new AppError("not-found", "no such API route"));
};
