import type { ReactNode } from "react";
import { Link } from "react-router";
import type { Project } from "@spanwright/contracts";
import { buttonClasses } from "../../components/Button";
import { PageHeader } from "../../components/PageHeader";

/** Header shared by the revisions, revision and compare pages: project > beam breadcrumbs. */
export function BeamPageHeader({
  project,
  beamId,
  beamName,
  title,
  children,
}: {
  project: Project;
  beamId: string;
  beamName: string;
  title: string;
  children?: ReactNode;
}) {
  const base = `/projects/${project.id}/beams/${beamId}`;
  return (
    <PageHeader
      title={title}
      eyebrow={
        <nav aria-label="Breadcrumbs" className="flex flex-wrap gap-1">
          <Link to="/projects" className="hover:text-ink-700 hover:underline">Projects</Link>
          <span aria-hidden="true">/</span>
          <Link to={`/projects/${project.id}`} className="hover:text-ink-700 hover:underline">{project.name}</Link>
          <span aria-hidden="true">/</span>
          <Link to={`${base}/revisions`} className="hover:text-ink-700 hover:underline">{beamName}</Link>
        </nav>
      }
      actions={
        <Link to={base} className={buttonClasses("secondary", "sm")}>
          Open in editor
        </Link>
      }
    >
      {children}
    </PageHeader>
  );
}
