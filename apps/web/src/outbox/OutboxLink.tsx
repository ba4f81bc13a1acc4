import { NavLink } from "react-router";
import { isApiError } from "../api/client";
import { useOutbox } from "../api/handoffs";

/**
 * The header link to the outbox, shown only when the API serves one: development and tests, and
 * only to project owners. A 404 (production) or 403 (not an owner) hides it, as does any error.
 */
export function OutboxLink({ className }: { className: (state: { isActive: boolean }) => string }) {
  const outbox = useOutbox();
  if (!outbox.isSuccess) return null;
  return (
    <NavLink to="/outbox" className={className}>
      Outbox
    </NavLink>
  );
}

/** The outbox is absent, not broken, when the API answers 404 or 403. */
export function isOutboxUnavailable(error: unknown): boolean {
  return isApiError(error) && (error.status === 404 || error.status === 403);
}
