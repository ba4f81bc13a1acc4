import { useId, useState } from "react";
import type { LoadSchedulePreviewResponse, ProjectUnits, ScheduleErrorJson } from "@spanwright/contracts";
import { describeError, isApiError } from "../api/client";
import { useApplyLoadSchedule, usePreviewLoadSchedule } from "../api/imports";
import { Alert } from "../components/Alert";
import { Button } from "../components/Button";
import { describeScheduleLoad } from "./describeScheduleLoad";
import { TableHead } from "../components/TableHead";

/** Errors sorted by line, whole-file problems (row 0) first, as a person fixes a spreadsheet. */
export function sortScheduleErrors(errors: readonly ScheduleErrorJson[]): ScheduleErrorJson[] {
  return [...errors].sort((a, b) => a.row - b.row);
}

/** Applying is allowed only for a preview the server found free of errors. */
export function canApplySchedule(preview: LoadSchedulePreviewResponse | undefined): boolean {
  return preview !== undefined && preview.ok && preview.errors.length === 0 && preview.preview.rows.length > 0;
}

/**
 * Load schedule upload: CSV (case, type, position, magnitude, values with units) -> server preview
 * with row-by-row errors -> apply as a new revision. Nothing is written before "Apply".
 */
export function LoadScheduleImport({
  projectId,
  beamId,
  baseVersion,
  units,
  onApplied,
}: {
  projectId: string;
  beamId: string;
  baseVersion: number;
  units: ProjectUnits;
  onApplied?: (version: number) => void;
}) {
  const inputId = useId();
  const [file, setFile] = useState<File | null>(null);
  const preview = usePreviewLoadSchedule(projectId, beamId);
  const apply = useApplyLoadSchedule(projectId, beamId);
  const result = preview.data;
  const errors = result !== undefined ? sortScheduleErrors(result.errors) : [];

  return (
    <div className="space-y-3 text-sm">
      <div className="flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor={inputId} className="mb-1 block font-medium text-ink-800">Load schedule (CSV)</label>
          <input
            id={inputId}
            type="file"
            accept=".csv,text/csv"
            onChange={(e) => {
              const picked = e.target.files?.[0] ?? null;
              setFile(picked);
              apply.reset();
              if (picked !== null) preview.mutate(picked);
              else preview.reset();
            }}
            className="block text-sm"
          />
        </div>
        <Button
          variant="primary"
          size="sm"
          disabled={!canApplySchedule(result) || file === null || apply.isSuccess}
          busy={apply.isPending}
          busyLabel="Applying…"
          onClick={() => {
            if (file === null) return;
            apply.mutate({ file, baseVersion }, { onSuccess: (revision) => onApplied?.(revision.version) });
          }}
        >
          Apply as a new revision
        </Button>
      </div>
      <p className="text-xs text-paper-600">
        Columns: case, type (point, moment, distributed, settlement), position, magnitude, each value with its unit, e.g.
        “-12 kN”, “0..6 m”, “-3..-5 kN/m”. Gravity loads are negative.
      </p>
      {preview.isPending && <p role="status" className="text-paper-600">Checking the file…</p>}
      {preview.isError && (
        <Alert tone="error" title="The file could not be read">
          {isApiError(preview.error) && preview.error.code === "file-too-large"
            ? "The file is larger than the upload limit."
            : describeError(preview.error)}
        </Alert>
      )}
      {errors.length > 0 && (
        <div>
          <Alert tone="error" title={`${errors.length} problem${errors.length === 1 ? "" : "s"} in the file; nothing can be applied until they are fixed`} />
          <table className="mt-2 w-full text-left">
            <caption className="sr-only">Problems by line</caption>
            <TableHead compact columns={["Line", "Column", "Problem"]} />
            <tbody>
              {errors.map((e, i) => (
                <tr key={`${e.row}-${e.column ?? ""}-${i}`} className="border-b border-paper-100 text-danger-700 last:border-0">
                  <td className="tabular py-1.5 pr-3">{e.row === 0 ? "file" : e.row}</td>
                  <td className="py-1.5 pr-3">{e.column ?? "—"}</td>
                  <td className="py-1.5">{e.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {result !== undefined && result.preview.rows.length > 0 && (
        <table className="w-full text-left">
          <caption className="mb-1 text-left font-medium text-ink-800">Loads to add</caption>
          <TableHead compact columns={["Line", "Case", "Load"]} />
          <tbody>
            {result.preview.rows.map((r) => {
              const created = result.preview.cases.find((c) => c.id === r.caseId)?.willCreate === true;
              return (
                <tr key={r.row} className="border-b border-paper-100 last:border-0">
                  <td className="tabular py-1.5 pr-3">{r.row}</td>
                  <td className="py-1.5 pr-3">{r.caseId}{created && <span className="ml-1 text-xs text-paper-600">(new case)</span>}</td>
                  <td className="tabular py-1.5">{describeScheduleLoad(r.load, units)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      {apply.isError && (
        <Alert tone="error" title="Not applied">
          {isApiError(apply.error) && apply.error.code === "version-conflict"
            ? "Someone saved a newer revision meanwhile. Reload the page and upload the file again."
            : describeError(apply.error)}
        </Alert>
      )}
      {apply.isSuccess && <Alert tone="success" title={`Applied as r${apply.data.version}`} />}
    </div>
  );
}
