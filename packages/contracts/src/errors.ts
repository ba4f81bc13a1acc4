import { z } from "zod";

/** Every error code the API answers with. The HTTP status for each is in `errorStatus`. */
export const errorCodes = [
  "invalid-request", // 400: body, query or path failed validation; details.issues name the fields
  "unauthenticated", // 401: no valid session
  "invalid-credentials", // 401: wrong e-mail or password at sign-in / password change
  "csrf", // 403: state-changing request from another origin
  "forbidden", // 403: a member whose role does not allow this
  "not-found", // 404: no such thing, or not a member of its project
  "email-taken", // 409: sign-up with an e-mail that already has an account
  "already-member", // 409
  "last-owner", // 409: the last owner cannot be removed or demoted
  "version-conflict", // 409: baseVersion is not the latest; details.current is the latest revision
  "already-checked", // 409: a checked revision is immutable
  "name-taken", // 409: a project section with this name exists; details.name
  "verification-token-invalid", // 400: an e-mail verification token that is unknown or already used
  "file-too-large", // 413: an upload over uploadLimits.fileBytes (nothing is written)
  "verification-token-expired", // 422: an e-mail verification link past its expiry; ask for a new one
  "invalid-file", // 422: an upload that is not what the route takes (not JSON, not CSV, no file)
  "invalid-schedule", // 422: a load schedule with row errors; details.errors lists them
  "invalid-recipient", // 422: a hand-off recipient who is not a viewer member; details.recipient
  "invalid-section", // 422: a section shape or material the design rules reject; details.field names it
  "mail-failed", // 502: the SMTP server did not accept the hand-off; nothing was recorded
  "too-large", // 413 for bodies over the byte limit, 422 for models over the size limits
  "invalid-model", // 422: the solver rejected the model; details.where names the path
  "mechanism", // 422: the beam cannot carry load
  "rate-limited", // 429
  "internal", // 500
  "database-unavailable", // 503
  "solver-busy", // 503: every solver thread is busy and the queue is full; Retry-After says when to retry
] as const;
export const errorCodeSchema = z.enum(errorCodes);
export type ErrorCode = z.infer<typeof errorCodeSchema>;

export const errorStatus: Record<ErrorCode, number> = {
  "invalid-request": 400,
  unauthenticated: 401,
  "invalid-credentials": 401,
  csrf: 403,
  forbidden: 403,
  "not-found": 404,
  "email-taken": 409,
  "already-member": 409,
  "last-owner": 409,
  "version-conflict": 409,
  "already-checked": 409,
  "name-taken": 409,
  "verification-token-invalid": 400,
  "file-too-large": 413,
  "verification-token-expired": 422,
  "invalid-file": 422,
  "invalid-schedule": 422,
  "invalid-recipient": 422,
  "invalid-section": 422,
  "mail-failed": 502,
  "too-large": 422,
  "invalid-model": 422,
  mechanism: 422,
  "rate-limited": 429,
  internal: 500,
  "database-unavailable": 503,
  "solver-busy": 503,
};

export const validationIssueSchema = z.object({
  /** Dotted path of the offending field, e.g. `model.segments.2.I` or `email`. */
  path: z.string(),
  message: z.string(),
});
export type ValidationIssue = z.infer<typeof validationIssueSchema>;

/** The one error body: `{ error: { code, message, details } }`. */
export const errorBodySchema = z.object({
  error: z.object({
    code: errorCodeSchema,
    message: z.string(),
    /** For solver errors (`invalid-model`, `mechanism`, `too-large`): the model path, as in the exchange format. */
    where: z.string().optional(),
    details: z.record(z.string(), z.unknown()).optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;

/** Size limits of the API (the solver library itself has none). Over them: `too-large`. */
export const apiLimits = {
  bodyBytes: 1_000_000,
  nodes: 1000,
  loadCases: 50,
  loadsPerCase: 500,
  combinations: 50,
  /** Requested output positions (`stations`). */
  stations: 5000,
  /**
   * The solver's work as the API estimates it (apps/api/src/solve/engine.ts `measureWork`):
   * nodes × loads + patterned cases × nodes³ / 20 + stations × (cases + combinations). A model at
   * this bound solves in about a second on the 2-core server, well inside SOLVE_TIMEOUT_MS (5 s).
   */
  work: 250_000,
} as const;
