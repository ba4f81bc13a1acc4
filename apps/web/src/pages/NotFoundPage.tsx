import { Link } from "react-router";
import { buttonClasses } from "../components/Button";

export function NotFoundPage() {
  return (
    <div className="max-w-lg py-8">
      <p className="text-sm font-medium text-ochre-600">Not found</p>
      <h1 className="mt-1 text-2xl font-semibold text-ink-900">Nothing lives at this address</h1>
      <p className="mt-2 text-paper-700">
        The page may have moved, or the project may not be shared with you.
      </p>
      <Link to="/projects" className={`${buttonClasses("secondary")} mt-6`}>
        Back to projects
      </Link>
    </div>
  );
}
