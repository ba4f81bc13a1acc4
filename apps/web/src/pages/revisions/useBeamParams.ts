import { useParams } from "react-router";

/** :projectId and :beamId of the current route; these pages are only mounted on such paths. */
export function useBeamParams(): { projectId: string; beamId: string } {
  const { projectId, beamId } = useParams();
  if (projectId === undefined || beamId === undefined) throw new Error("useBeamParams used outside a beam route");
  return { projectId, beamId };
}
