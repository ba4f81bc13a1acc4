import { Link } from "react-router";
import { isApiError } from "../../api/client";
import { useProject } from "../../api/projects";
import { PageHeader } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { roleLabels, unitSystemLabels } from "../../roleLabels";
import { NotFoundPage } from "../NotFoundPage";
import { BeamsSection } from "./BeamsSection";
import { MembersSummary } from "./MembersSummary";
import { ProjectHandoffsSection } from "./ProjectHandoffsSection";
import { ProjectSettings } from "./ProjectSettings";
import { useProjectId } from "./useProjectId";

export function RoleBadge({ children }: { children: string }) {
  return (
    <span className="inline-flex items-center rounded-sm bg-ochre-100 px-2 py-0.5 text-xs font-medium text-ochre-800">
      {children}
    </span>
  );
}

export function ProjectPage() {
  const projectId = useProjectId();
  const project = useProject(projectId);

  if (project.isPending) return <Loading label="Loading project…" />;
  if (project.isError) {
    if (isApiError(project.error) && project.error.status === 404) return <NotFoundPage />;
    return <QueryError error={project.error} title="Could not load the project" onRetry={() => void project.refetch()} />;
  }
  const p = project.data;
  return (
    <>
      <PageHeader
        title={p.name}
        eyebrow={
          <Link to="/projects" className="hover:text-ink-700 hover:underline">
            Projects
          </Link>
        }
      >
        <div className="mt-2 flex flex-wrap items-center gap-3 text-sm text-paper-700">
          <RoleBadge>{`You: ${roleLabels[p.role]}`}</RoleBadge>
          <span>{unitSystemLabels[p.unitSystem]}</span>
        </div>
      </PageHeader>
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div className="min-w-0 space-y-6">
          <BeamsSection project={p} />
          <ProjectHandoffsSection project={p} />
        </div>
        <div className="space-y-6">
          <MembersSummary project={p} />
          <ProjectSettings project={p} />
        </div>
      </div>
    </>
  );
}
