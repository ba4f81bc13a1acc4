import { Navigate, useLocation } from "react-router";
import { useMe } from "../api/auth";
import { AppShell } from "./AppShell";
import { FullPageLoading } from "./FullPageLoading";
import { QueryError } from "./QueryState";

/** Everything behind sign-in: without a session, go to /sign-in and come back afterwards. */
export function RequireAuth() {
  const me = useMe();
  const location = useLocation();

  if (me.isPending) return <FullPageLoading />;
  if (me.isError) {
    return (
      <div className="mx-auto max-w-lg p-8">
        <QueryError error={me.error} title="Could not check your session" onRetry={() => void me.refetch()} />
      </div>
    );
  }
  if (me.data === null) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={`/sign-in?next=${encodeURIComponent(next)}`} replace />;
  }
  return <AppShell user={me.data} />;
}
