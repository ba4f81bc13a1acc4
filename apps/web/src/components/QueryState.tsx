import { describeError, isApiError } from "../api/client";
import { Alert } from "./Alert";
import { Button } from "./Button";

export function Loading({ label = "Loading…" }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-3 py-6 text-sm text-paper-600">
      <span
        aria-hidden="true"
        className="inline-block size-4 motion-safe:animate-spin rounded-full border-2 border-paper-300 border-t-ink-600"
      />
      {label}
    </div>
  );
}

/** Error state of a query: what went wrong in words, and a retry unless retrying cannot help. */
export function QueryError({
  error,
  title = "Could not load this",
  onRetry,
}: {
  error: unknown;
  title?: string;
  onRetry?: () => void;
}) {
  const retryable = !isApiError(error) || error.status === 0 || error.status >= 500;
  return (
    <Alert tone="error" title={title}>
      <p>{describeError(error)}</p>
      {retryable && onRetry !== undefined && (
        <Button variant="secondary" size="sm" className="mt-2" onClick={onRetry}>
          Try again
        </Button>
      )}
    </Alert>
  );
}
