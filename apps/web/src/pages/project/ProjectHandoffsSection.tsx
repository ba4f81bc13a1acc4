import { can, type Project } from "@spanwright/contracts";
import { useProjectHandoffs } from "../../api/handoffs";
import { Card } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { HandoffHistory } from "../../handoffs/HandoffHistory";
import { StaleHandoffBanner } from "../../handoffs/StaleHandoffBanner";

/** The project's hand-offs: who holds which reactions, and who holds outdated ones. */
export function ProjectHandoffsSection({ project }: { project: Project }) {
  const handoffs = useProjectHandoffs(project.id);
  return (
    <Card title="Hand-offs">
      {handoffs.isPending && <Loading label="Loading hand-offs…" />}
      {handoffs.isError && <QueryError error={handoffs.error} title="Could not load the hand-offs" onRetry={() => void handoffs.refetch()} />}
      {handoffs.isSuccess && (
        <div className="space-y-4">
          <StaleHandoffBanner handoffs={handoffs.data} canIssue={can(project.role, "edit")} />
          <HandoffHistory handoffs={handoffs.data} showBeam />
        </div>
      )}
    </Card>
  );
}
