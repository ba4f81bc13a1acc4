import { useParams } from "react-router";

/** The :projectId of the current route; the router only mounts these pages on such paths. */
export function useProjectId(): string {
  const { projectId } = useParams();
  if (projectId === undefined) throw new Error("useProjectId used outside a /projects/:projectId route");
  return projectId;
}
