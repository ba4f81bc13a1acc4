import { isRouteErrorResponse, Link, useRouteError } from "react-router";
import { describeError } from "../api/client";
import { buttonClasses } from "../components/Button";
import { Wordmark } from "../components/Logo";

/** Last resort for a route that failed to load (e.g. a chunk missing after a deploy) or threw. */
export function RouteErrorPage() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : describeError(error);
  return (
    <div className="mx-auto max-w-lg px-6 py-16">
      <Wordmark />
      <h1 className="mt-8 text-2xl font-semibold text-ink-900">This page could not be shown</h1>
      <p className="mt-2 text-paper-700">{message}</p>
      <div className="mt-6 flex gap-3">
        <button type="button" className={buttonClasses("primary")} onClick={() => window.location.reload()}>
          Reload
        </button>
        <Link to="/projects" className={buttonClasses("secondary")}>
          Go to projects
        </Link>
      </div>
    </div>
  );
}
