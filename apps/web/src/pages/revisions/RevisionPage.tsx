import { useState } from "react";
import { useParams } from "react-router";
import { can } from "@spanwright/contracts";
import { isApiError } from "../../api/client";
import { useBeam } from "../../api/beams";
import { useProject } from "../../api/projects";
import { useReactions, useRevision } from "../../api/revisions";
import { Button } from "../../components/Button";
import { Card } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { formatDate } from "../../formatDate";
import { HandoffDialog } from "../../handoffs/HandoffDialog";
import { CheckRevisionForm } from "../../revisions/CheckRevisionForm";
import { ChecksReportLink } from "../../revisions/ChecksReportLink";
import { DownloadLinks } from "../../revisions/DownloadLinks";
import { ReactionTable } from "../../revisions/ReactionTable";
import { RevisionStatusBadge } from "../../revisions/RevisionStatusBadge";
import { unitsFor } from "../../revisions/reactionUnits";
import { NotFoundPage } from "../NotFoundPage";
import { BeamPageHeader } from "./BeamPageHeader";
import { ModelOverview } from "./ModelOverview";
import { useBeamParams } from "./useBeamParams";

/** One saved revision, read-only: what the viewer opens from a hand-off e-mail. */
export function RevisionPage() {
  const { projectId, beamId } = useBeamParams();
  const version = Number(useParams().version);
  if (!Number.isInteger(version) || version <= 0) return <NotFoundPage />;
  return <RevisionView projectId={projectId} beamId={beamId} version={version} />;
}

function RevisionView({ projectId, beamId, version }: { projectId: string; beamId: string; version: number }) {
  const project = useProject(projectId);
  const beam = useBeam(projectId, beamId);
  const revision = useRevision(projectId, beamId, version);
  const reactions = useReactions(projectId, beamId, version);
  const [issuing, setIssuing] = useState(false);

  if (project.isPending || beam.isPending || revision.isPending) return <Loading label="Loading revision…" />;
  const failed = project.error ?? beam.error ?? revision.error;
  if (failed !== null) {
    if (isApiError(failed) && failed.status === 404) return <NotFoundPage />;
    return <QueryError error={failed} title="Could not load the revision" />;
  }
  const p = project.data!;
  const b = beam.data!.beam;
  const r = revision.data!;

  return (
    <>
      <BeamPageHeader project={p} beamId={beamId} beamName={b.name} title={`${b.name}, r${r.version}`}>
        <div className="mt-2 flex flex-wrap items-center gap-3 text-sm text-paper-700">
          <RevisionStatusBadge status={r.status} />
          <span>{`Saved by ${r.author.name}, ${formatDate(r.createdAt, true)}`}</span>
          {r.checkedBy !== null && <span>{`Checked by ${r.checkedBy.name}`}</span>}
          {r.version < b.latestVersion && <span className="font-medium text-caution-700">{`Not the latest: r${b.latestVersion} exists.`}</span>}
        </div>
      </BeamPageHeader>
      <div className="space-y-6">
        <Card title="This revision">
          <div className="flex flex-wrap items-start justify-between gap-4 text-sm">
            <div className="space-y-1">
              <p className="whitespace-pre-line text-paper-800">{r.changeSummary === "" ? "No change summary." : r.changeSummary}</p>
              {r.checkComment !== null && r.checkComment !== "" && <p className="italic text-paper-600">{`Checker: “${r.checkComment}”`}</p>}
            </div>
            <div className="flex flex-col items-end gap-2">
              <DownloadLinks projectId={projectId} beamId={beamId} version={r.version} />
              <ChecksReportLink projectId={projectId} beamId={beamId} version={r.version} units={p.unitSystem} />
              {can(p.role, "edit") && <Button variant="accent" size="sm" onClick={() => setIssuing(true)}>{`Issue r${r.version}…`}</Button>}
              {can(p.role, "check") && r.status === "draft" && <CheckRevisionForm projectId={projectId} beamId={beamId} version={r.version} />}
            </div>
          </div>
        </Card>
        <Card title="Model">
          <ModelOverview model={r.model} units={reactions.data?.units ?? unitsFor(p.unitSystem)} />
        </Card>
        <Card title="Reactions">
          {reactions.isPending && <Loading label="Loading reactions…" />}
          {reactions.isError && <QueryError error={reactions.error} title="Could not load the reactions" onRetry={() => void reactions.refetch()} />}
          {reactions.isSuccess && <ReactionTable table={reactions.data.table} units={reactions.data.units} caption={`Support reactions of r${r.version}`} />}
        </Card>
      </div>
      {issuing && <HandoffDialog projectId={projectId} beamId={beamId} beamName={b.name} version={r.version} onClose={() => setIssuing(false)} />}
    </>
  );
}
