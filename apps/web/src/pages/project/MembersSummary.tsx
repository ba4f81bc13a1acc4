import { Link } from "react-router";
import { can, roles, type Project } from "@spanwright/contracts";
import { useMembers } from "../../api/members";
import { Card } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { roleLabels } from "../../roleLabels";

export function MembersSummary({ project }: { project: Project }) {
  const members = useMembers(project.id);
  const manage = can(project.role, "manage");
  return (
    <Card
      title="Members"
      actions={
        <Link
          to={`/projects/${project.id}/members`}
          className="text-sm font-medium text-ink-700 underline underline-offset-2 hover:text-ink-900"
        >
          {manage ? "Manage" : "View all"}
        </Link>
      }
    >
      {members.isPending && <Loading label="Loading members…" />}
      {members.isError && (
        <QueryError error={members.error} title="Could not load the members" onRetry={() => void members.refetch()} />
      )}
      {members.isSuccess && (
        <dl className="space-y-2 text-sm">
          {roles.map((role) => {
            const inRole = members.data.filter((m) => m.role === role);
            if (inRole.length === 0) return null;
            return (
              <div key={role}>
                <dt className="text-xs font-medium uppercase tracking-wide text-paper-600">
                  {roleLabels[role]} <span className="tabular">({inRole.length})</span>
                </dt>
                <dd className="text-ink-800">
                  {inRole.map((m) => (m.pending ? `${m.email} (invited)` : m.name)).join(", ")}
                </dd>
              </div>
            );
          })}
        </dl>
      )}
    </Card>
  );
}
