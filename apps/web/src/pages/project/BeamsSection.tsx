import { Link, useNavigate } from "react-router";
import { can, type Project } from "@spanwright/contracts";
import { useBeams, useDeleteBeam } from "../../api/beams";
import { describeError } from "../../api/client";
import { Alert } from "../../components/Alert";
import { ConfirmButton } from "../../components/ConfirmButton";
import { Card } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { formatDate } from "../../formatDate";
import { CreateBeamForm } from "./CreateBeamForm";
import { ImportBeamForm } from "./ImportBeamForm";
import { TableHead } from "../../components/TableHead";

export function BeamsSection({ project }: { project: Project }) {
  const beams = useBeams(project.id);
  const remove = useDeleteBeam(project.id);
  const navigate = useNavigate();
  const canEdit = can(project.role, "edit");

  return (
    <Card title="Beams">
      {beams.isPending && <Loading label="Loading beams…" />}
      {beams.isError && (
        <QueryError error={beams.error} title="Could not load the beams" onRetry={() => void beams.refetch()} />
      )}
      {remove.isError && (
        <div className="mb-3">
          <Alert tone="error" title="Could not delete the beam">
            {describeError(remove.error)}
          </Alert>
        </div>
      )}
      {beams.isSuccess && beams.data.length === 0 && (
        <p className="py-4 text-sm text-paper-600">
          No beams yet.{canEdit ? " Add the first one below." : ""}
        </p>
      )}
      {beams.isSuccess && beams.data.length > 0 && (
        <table className="w-full text-left text-sm">
          <TableHead columns={["Beam", "Revision", "Updated", canEdit && { label: "Actions", hidden: true }]} />
          <tbody>
            {beams.data.map((beam) => (
              <tr key={beam.id} className="border-b border-paper-100 last:border-0">
                <td className="py-2.5 pr-3">
                  <Link
                    to={`/projects/${project.id}/beams/${beam.id}`}
                    className="font-medium text-ink-800 underline-offset-2 hover:underline"
                  >
                    {beam.name}
                  </Link>
                </td>
                <td className="tabular py-2.5 pr-3 text-paper-700">
                  <Link
                    to={`/projects/${project.id}/beams/${beam.id}/revisions`}
                    className="underline-offset-2 hover:underline"
                    aria-label={`Revisions of ${beam.name}, latest r${beam.latestVersion}`}
                  >
                    r{beam.latestVersion}
                  </Link>
                </td>
                <td className="tabular py-2.5 pr-3 text-paper-700">{formatDate(beam.updatedAt, true)}</td>
                {canEdit && (
                  <td className="py-2.5 text-right">
                    <ConfirmButton
                      label="Delete"
                      confirmLabel="Delete beam"
                      question={`Delete ${beam.name} and all its revisions?`}
                      busy={remove.isPending && remove.variables === beam.id}
                      onConfirm={() => remove.mutate(beam.id)}
                    />
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {canEdit ? (
        <div className="mt-5 border-t border-paper-200 pt-4">
          <CreateBeamForm
            projectId={project.id}
            onCreated={(beamId) => void navigate(`/projects/${project.id}/beams/${beamId}`)}
          />
          <details className="mt-4">
            <summary className="cursor-pointer text-sm font-medium text-ink-800">Import a beam from a JSON file</summary>
            <div className="mt-3">
              <ImportBeamForm
                projectId={project.id}
                onImported={(beamId) => void navigate(`/projects/${project.id}/beams/${beamId}`)}
              />
            </div>
          </details>
        </div>
      ) : (
        <p className="mt-4 text-xs text-paper-600">Your role can open beams but not add or delete them.</p>
      )}
    </Card>
  );
}
