import { Link } from "react-router";
import { can, type Project, type RevisionSummary } from "@spanwright/contracts";
import { Button } from "../components/Button";
import { formatDate } from "../formatDate";
import { CheckRevisionForm } from "./CheckRevisionForm";
import { DownloadLinks } from "./DownloadLinks";
import { RevisionStatusBadge } from "./RevisionStatusBadge";
import { TableHead } from "../components/TableHead";

/** Every saved revision of a beam, newest first, with what each role may do to it. */
export function RevisionList({
  project,
  beamId,
  revisions,
  onIssue,
}: {
  project: Project;
  beamId: string;
  revisions: readonly RevisionSummary[];
  onIssue: (version: number) => void;
}) {
  const canCheck = can(project.role, "check");
  const canIssue = can(project.role, "edit");
  const sorted = [...revisions].sort((a, b) => b.version - a.version);
  const base = `/projects/${project.id}/beams/${beamId}`;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm">
        <TableHead columns={["Revision", "Status", "Author", "Saved", "Changes", "Actions"]} />
        <tbody>
          {sorted.map((r) => (
            <tr key={r.version} className="border-b border-paper-100 align-top last:border-0">
              <td className="tabular py-2.5 pr-3">
                <Link to={`${base}/revisions/${r.version}`} className="font-medium text-ink-800 underline-offset-2 hover:underline" aria-label={`Open r${r.version} read-only`}>
                  r{r.version}
                </Link>
              </td>
              <td className="py-2.5 pr-3">
                <RevisionStatusBadge status={r.status} />
                {r.checkedBy !== null && (
                  <p className="mt-1 text-xs text-paper-600">
                    {`by ${r.checkedBy.name}${r.checkedAt !== null ? `, ${formatDate(r.checkedAt)}` : ""}`}
                  </p>
                )}
                {r.checkComment !== null && r.checkComment !== "" && (
                  <p className="mt-0.5 max-w-[14rem] text-xs italic text-paper-600">{`“${r.checkComment}”`}</p>
                )}
              </td>
              <td className="py-2.5 pr-3 text-paper-800">{r.author.name}</td>
              <td className="tabular whitespace-nowrap py-2.5 pr-3 text-paper-700">{formatDate(r.createdAt, true)}</td>
              <td className="max-w-[22rem] whitespace-pre-line py-2.5 pr-3 text-paper-800">{r.changeSummary === "" ? "—" : r.changeSummary}</td>
              <td className="space-y-1.5 py-2.5">
                <DownloadLinks projectId={project.id} beamId={beamId} version={r.version} />
                <div className="flex flex-wrap gap-2">
                  {r.version > 1 && (
                    <Link to={`${base}/compare?from=${r.version - 1}&to=${r.version}`} className="text-sm text-ink-700 underline-offset-2 hover:underline">
                      {`Compare with r${r.version - 1}`}
                    </Link>
                  )}
                  {canIssue && (
                    <Button variant="secondary" size="sm" onClick={() => onIssue(r.version)}>
                      Issue…
                    </Button>
                  )}
                </div>
                {canCheck && r.status === "draft" && <CheckRevisionForm projectId={project.id} beamId={beamId} version={r.version} />}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
