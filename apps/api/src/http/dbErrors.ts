/**
 * Recognises "the database is not reachable" among thrown errors (drizzle wraps the driver's error
 * in `cause`). SQLSTATE classes 08 (connection) and 57P (operator intervention), 53300 (too many
 * connections) and 3D000 (database missing) mean the server, not the request, is at fault.
 */
const connectionCodes = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "ENOTFOUND",
  "EHOSTUNREACH",
  "CONNECT_TIMEOUT",
  "CONNECTION_CLOSED",
  "CONNECTION_ENDED",
  "CONNECTION_DESTROYED",
  "53300",
  "3D000",
]);

export function isDatabaseUnavailable(error: unknown): boolean {
  let current: unknown = error;
  for (let depth = 0; depth < 5 && current && typeof current === "object"; depth++) {
    const code = (current as { code?: unknown }).code;
    if (typeof code === "string" && (connectionCodes.has(code) || code.startsWith("08") || code.startsWith("57P"))) {
      return true;
    }
    if (current instanceof AggregateError && current.errors.some(isDatabaseUnavailable)) return true;
    current = (current as { cause?: unknown }).cause;
  }
  return false;
}

/** A unique-constraint violation (SQLSTATE 23505) on the named constraint, anywhere in the cause chain. */
export function isUniqueViolation(error: unknown, constraint: string): boolean {
  let current: unknown = error;
  for (let depth = 0; depth < 5 && current && typeof current === "object"; depth++) {
    const e = current as { code?: unknown; constraint_name?: unknown };
    if (e.code === "23505" && e.constraint_name === constraint) return true;
    current = (current as { cause?: unknown }).cause;
  }
  return false;
}
