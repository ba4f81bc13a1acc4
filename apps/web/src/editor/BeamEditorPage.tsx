import { useState } from "react";
import { Link, useParams } from "react-router";
import { can } from "@spanwright/contracts";
import { useBeam } from "../api/beams";
import { useProject } from "../api/projects";
import { Loading, QueryError } from "../components/QueryState";
import { EditorSession } from "./session/EditorSession";
import { getSolverWorker } from "./results/solverWorker";

/**
 * Route /projects/:projectId/beams/:beamId: loads the beam's latest revision and opens it. The
 * open document then lives in the editor store, not the query cache; saving creates a revision.
 */
export function BeamEditorPage() {
  const { projectId = "", beamId = "" } = useParams();
  useState(getSolverWorker); // start the engine worker while the beam loads
  const beam = useBeam(projectId, beamId);
  const project = useProject(projectId);
  if (beam.isPending || project.isPending) return <Loading label="Opening beam…" />;
  if (beam.isError) return <QueryError error={beam.error} title="Could not load the beam" onRetry={() => void beam.refetch()} />;
  const units = project.data?.unitSystem ?? "si";
  const canEdit = project.data ? can(project.data.role, "edit") : false;
  return (
    <div className="space-y-2">
      <Link to={`/projects/${projectId}`} className="text-sm text-paper-600 hover:underline">
        ← {project.data?.name ?? "Back to project"}
      </Link>
      {/* A new key per beam gives each beam a fresh store, history and draft. */}
      <EditorSession key={`${projectId}/${beamId}`} projectId={projectId} initial={beam.data} units={units} canEdit={canEdit} />
    </div>
  );
}
