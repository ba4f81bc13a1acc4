import { Link, useNavigate } from "react-router";
import { useProjects } from "../../api/projects";
import { Card, PageHeader } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { formatDate } from "../../formatDate";
import { roleLabels, unitSystemLabels } from "../../roleLabels";
import { VerifyEmailBanner } from "../verify/VerifyEmailBanner";
import { CreateProjectForm } from "./CreateProjectForm";

export function ProjectsPage() {
  const projects = useProjects();
  const navigate = useNavigate();

  return (
    <>
      <PageHeader title="Projects" eyebrow="Your workspace" />
      <VerifyEmailBanner />
      <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <section aria-labelledby="project-list-heading">
          <h2 id="project-list-heading" className="sr-only">
            Project list
          </h2>
          {projects.isPending && <Loading label="Loading projects…" />}
          {projects.isError && (
            <QueryError error={projects.error} title="Could not load your projects" onRetry={() => void projects.refetch()} />
          )}
          {projects.isSuccess && projects.data.length === 0 && (
            <div className="rounded-lg border border-dashed border-paper-400 px-6 py-10 text-center">
              <p className="font-medium text-ink-900">No projects yet</p>
              <p className="mt-1 text-sm text-paper-600">
                Create one to start modelling beams, or ask a project lead to add you to theirs.
              </p>
            </div>
          )}
          {projects.isSuccess && projects.data.length > 0 && (
            <ul className="grid gap-3 sm:grid-cols-2">
              {projects.data.map((project) => (
                <li key={project.id}>
                  <Link
                    to={`/projects/${project.id}`}
                    className="group block h-full rounded-lg border border-paper-300 bg-white p-5 shadow-card transition-colors hover:border-ink-300"
                  >
                    <p className="truncate text-lg font-semibold text-ink-900 group-hover:text-ink-700">
                      {project.name}
                    </p>
                    <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
                      <dt className="text-paper-600">Your role</dt>
                      <dd className="text-ink-800">{roleLabels[project.role]}</dd>
                      <dt className="text-paper-600">Units</dt>
                      <dd className="text-ink-800">{unitSystemLabels[project.unitSystem]}</dd>
                      <dt className="text-paper-600">Updated</dt>
                      <dd className="tabular text-ink-800">{formatDate(project.updatedAt)}</dd>
                    </dl>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </section>
        <aside>
          <Card title="New project">
            <CreateProjectForm onCreated={(project) => void navigate(`/projects/${project.id}`)} />
          </Card>
        </aside>
      </div>
    </>
  );
}
