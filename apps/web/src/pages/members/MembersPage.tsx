import { Link } from "react-router";
import { can, roles } from "@spanwright/contracts";
import { useMe } from "../../api/auth";
import { isApiError } from "../../api/client";
import { useMembers } from "../../api/members";
import { useProject } from "../../api/projects";
import { Card, PageHeader } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { roleDescriptions, roleLabels } from "../../roleLabels";
import { NotFoundPage } from "../NotFoundPage";
import { useProjectId } from "../project/useProjectId";
import { InviteMemberForm } from "./InviteMemberForm";
import { MembersTable } from "./MembersTable";

export function MembersPage() {
  const projectId = useProjectId();
  const project = useProject(projectId);
  const members = useMembers(projectId);
  const me = useMe();

  if (project.isPending) return <Loading label="Loading project…" />;
  if (project.isError) {
    if (isApiError(project.error) && project.error.status === 404) return <NotFoundPage />;
    return <QueryError error={project.error} title="Could not load the project" onRetry={() => void project.refetch()} />;
  }
  const canManage = can(project.data.role, "manage");

  return (
    <>
      <PageHeader
        title="Members"
        eyebrow={
          <>
            <Link to="/projects" className="hover:text-ink-700 hover:underline">Projects</Link>
            <span aria-hidden="true"> / </span>
            <Link to={`/projects/${projectId}`} className="hover:text-ink-700 hover:underline">
              {project.data.name}
            </Link>
          </>
        }
      />
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div className="space-y-6">
          <Card title="People on this project">
            {members.isPending && <Loading label="Loading members…" />}
            {members.isError && (
              <QueryError error={members.error} title="Could not load the members" onRetry={() => void members.refetch()} />
            )}
            {members.isSuccess && (
              <MembersTable
                projectId={projectId}
                members={members.data}
                currentUserId={me.data?.id ?? ""}
                canManage={canManage}
              />
            )}
          </Card>
          {canManage ? (
            <Card title="Invite by e-mail">
              <InviteMemberForm projectId={projectId} />
            </Card>
          ) : (
            <p className="text-sm text-paper-600">Only a project lead can invite members or change roles.</p>
          )}
        </div>
        <Card title="What each role can do">
          <dl className="space-y-3 text-sm">
            {roles.map((role) => (
              <div key={role}>
                <dt className="font-medium text-ink-900">{roleLabels[role]}</dt>
                <dd className="text-paper-700">{roleDescriptions[role]}</dd>
              </div>
            ))}
          </dl>
        </Card>
      </div>
    </>
  );
}
