import { Link, useParams } from "react-router";
import { useBeam } from "../api/beams";
import { Caution } from "../components/Caution";
import { Loading, QueryError } from "../components/QueryState";

/**
 * Placeholder created by the app shell so the route resolves; the beam editor replaces this file.
 * Contract with the router: a named export `BeamEditorPage`, reading :projectId and :beamId itself.
 */
export function BeamEditorPage() {
  const { projectId = "", beamId = "" } = useParams();
  const beam = useBeam(projectId, beamId);
  if (beam.isPending) return <Loading label="Loading beam…" />;
  if (beam.isError) return <QueryError error={beam.error} title="Could not load the beam" onRetry={() => void beam.refetch()} />;
  return (
    <div className="space-y-4">
      <Link to={`/projects/${projectId}`} className="text-sm text-paper-600 hover:underline">
        Back to project
      </Link>
      <h1 className="text-2xl font-semibold text-ink-900">{beam.data.beam.name}</h1>
      <p className="text-paper-700">Revision r{beam.data.revision.version}. The beam editor is not here yet.</p>
      <Caution />
    </div>
  );
}
