import { reactionsCsvUrl, reportPdfUrl } from "../api/revisions";

/** CSV in the project's units, the SI machine variant, and the PDF report of one revision. */
export function DownloadLinks({ projectId, beamId, version }: { projectId: string; beamId: string; version: number }) {
  const link = "text-ink-700 underline-offset-2 hover:underline";
  return (
    <span className="inline-flex flex-wrap gap-x-3 gap-y-1 text-sm">
      <a className={link} href={reactionsCsvUrl(projectId, beamId, version, "project")} download>CSV</a>
      <a className={link} href={reactionsCsvUrl(projectId, beamId, version, "si")} download title="Machine-readable, SI units">CSV (SI)</a>
      <a className={link} href={reportPdfUrl(projectId, beamId, version)} download>PDF report</a>
    </span>
  );
}
