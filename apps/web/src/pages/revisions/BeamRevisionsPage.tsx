import { useState } from "react";
import { can } from "@spanwright/contracts";
import { isApiError } from "../../api/client";
import { useBeam } from "../../api/beams";
import { useBeamHandoffs } from "../../api/handoffs";
import { useProject } from "../../api/projects";
import { useReactions, useRevisions } from "../../api/revisions";
import { Card } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { HandoffDialog } from "../../handoffs/HandoffDialog";
import { HandoffHistory } from "../../handoffs/HandoffHistory";
import { StaleHandoffBanner } from "../../handoffs/StaleHandoffBanner";
import { LoadScheduleImport } from "../../revisions/LoadScheduleImport";
import { ReactionTable } from "../../revisions/ReactionTable";
import { RevisionList } from "../../revisions/RevisionList";
import { unitsFor } from "../../revisions/reactionUnits";
import { NotFoundPage } from "../NotFoundPage";
import { BeamPageHeader } from "./BeamPageHeader";
import { useBeamParams } from "./useBeamParams";

/** A beam's revisions: list, checking, downloads, issuing, hand-off history and the latest reactions. */
export function BeamRevisionsPage() {
  const { projectId, beamId } = useBeamParams();
  const project = useProject(projectId);
  const beam = useBeam(projectId, beamId);
  const revisions = useRevisions(projectId, beamId);
  const handoffs = useBeamHandoffs(projectId, beamId);
  const [issuing, setIssuing] = useState<number | null>(null);

  if (project.isPending || beam.isPending) return <Loading label="Loading beam…" />;
  const failed = project.isError ? project.error : beam.isError ? beam.error : null;
  if (failed !== null) {
    if (isApiError(failed) && failed.status === 404) return <NotFoundPage />;
    return <QueryError error={failed} title="Could not load the beam" />;
  }
  const p = project.data!;
  const b = beam.data!.beam;
  const canEdit = can(p.role, "edit");

  return (
    <>
      <BeamPageHeader project={p} beamId={beamId} beamName={b.name} title={`${b.name}: revisions`} />
      <div className="space-y-6">
        {handoffs.isSuccess && <StaleHandoffBanner handoffs={handoffs.data} canIssue={canEdit} />}
        <Card title="Revisions">
          {revisions.isPending && <Loading label="Loading revisions…" />}
          {revisions.isError && <QueryError error={revisions.error} title="Could not load the revisions" onRetry={() => void revisions.refetch()} />}
          {revisions.isSuccess && <RevisionList project={p} beamId={beamId} revisions={revisions.data} onIssue={setIssuing} />}
        </Card>
        <LatestReactions projectId={projectId} beamId={beamId} version={b.latestVersion} />
        <Card title="Hand-offs">
          {handoffs.isPending && <Loading label="Loading hand-offs…" />}
          {handoffs.isError && <QueryError error={handoffs.error} title="Could not load the hand-offs" onRetry={() => void handoffs.refetch()} />}
          {handoffs.isSuccess && <HandoffHistory handoffs={handoffs.data} />}
        </Card>
        {canEdit && (
          <Card title="Upload a load schedule">
            <LoadScheduleImport projectId={projectId} beamId={beamId} baseVersion={b.latestVersion} units={unitsFor(p.unitSystem)} />
          </Card>
        )}
      </div>
      {issuing !== null && (
        <HandoffDialog projectId={projectId} beamId={beamId} beamName={b.name} version={issuing} onClose={() => setIssuing(null)} />
      )}
    </>
  );
}

function LatestReactions({ projectId, beamId, version }: { projectId: string; beamId: string; version: number }) {
  const reactions = useReactions(projectId, beamId, version);
  return (
    <Card title={`Reactions, r${version}`}>
      {reactions.isPending && <Loading label="Loading reactions…" />}
      {reactions.isError && <QueryError error={reactions.error} title="Could not load the reactions" onRetry={() => void reactions.refetch()} />}
      {reactions.isSuccess && (
        <ReactionTable table={reactions.data.table} units={reactions.data.units} caption={`Support reactions of r${version}`} />
      )}
    </Card>
  );
}
