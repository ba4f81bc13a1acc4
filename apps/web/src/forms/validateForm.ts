import type { z } from "zod";
import { isApiError, type FieldErrors } from "../api/client";

export type FormResult<T> = { ok: true; data: T } | { ok: false; errors: FieldErrors };

/**
 * First message per dot-joined path, matching the keys the API client extracts from the server.
 * A rule on the whole object (e.g. "give at least one field") lands under the empty key "".
 */
export function fieldErrorsFromIssues(issues: readonly z.core.$ZodIssue[]): FieldErrors {
  const out: Record<string, string> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join(".");
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}

/**
 * Plain-words messages for zod's generic issues. Messages written on a schema itself win over
 * these (zod's precedence), so a contract's own wording is kept.
 */
export function friendlyIssueMessage(issue: z.core.$ZodRawIssue): string | undefined {
  switch (issue.code) {
    case "too_small":
      if (issue.origin === "string") {
        return Number(issue.minimum) <= 1 ? "Required." : `Use at least ${issue.minimum} characters.`;
      }
      if (issue.origin === "number") return `Use ${issue.minimum} or more.`;
      return undefined;
    case "too_big":
      if (issue.origin === "string") return `Use at most ${issue.maximum} characters.`;
      if (issue.origin === "number") return `Use ${issue.maximum} or less.`;
      return undefined;
    case "invalid_format":
      return issue.format === "email" ? "Enter a valid e-mail address." : undefined;
    case "invalid_type":
      return issue.expected === "number" ? "Enter a number." : undefined;
    default:
      return undefined;
  }
}

/** Runs the same zod schema the API uses, so the user sees the error before the round trip. */
export function validateForm<S extends z.ZodType>(schema: S, values: unknown): FormResult<z.output<S>> {
  const result = schema.safeParse(values, { error: friendlyIssueMessage });
  if (result.success) return { ok: true, data: result.data };
  return { ok: false, errors: fieldErrorsFromIssues(result.error.issues) };
}

/**
 * Field errors to show for a form: client errors win (they reflect what is typed now), then the
 * server's field errors from the last failed submit for fields the client did not flag.
 */
export function mergeFieldErrors(client: FieldErrors, serverError: unknown): FieldErrors {
  const server = isApiError(serverError) ? serverError.fieldErrors : {};
  return { ...server, ...client };
}

/**
 * The top-level message for a failed submit, or null when every problem is already shown beside
 * a field of this form (so the same words are not printed twice).
 */
export function formLevelMessage(serverError: unknown, fieldNames: readonly string[]): string | null {
  if (serverError === null || serverError === undefined) return null;
  if (!isApiError(serverError)) {
    return serverError instanceof Error ? serverError.message : "Something went wrong.";
  }
  const keys = Object.keys(serverError.fieldErrors);
  const allShown = keys.length > 0 && keys.every((k) => fieldNames.includes(k));
  return allShown ? null : serverError.message;
}
