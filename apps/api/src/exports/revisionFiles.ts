import {
  buildReactionTable,
  exportFileName,
  reactionTableCsv,
  reactionTableSiCsv,
  renderCalculationReport,
} from "@spanwright/handoff";
import type { RevisionContext } from "../revisions/revisionContext.js";
import type { ReportChecks } from "./reportChecks.js";

export interface RevisionFile {
  filename: string;
  contentType: string;
  content: Buffer;
}

export type CsvUnits = "project" | "si";

/** The reaction table as CSV: in the project's units for people, or SI at full precision for scripts. */
export function revisionCsv(ctx: RevisionContext, units: CsvUnits): RevisionFile {
  const table = buildReactionTable(ctx.model, ctx.result);
  const text = units === "si" ? reactionTableSiCsv(table) : reactionTableCsv(table, { units: ctx.project.unitSystem });
  return {
    filename: exportFileName(ctx.beam.name, ctx.revision.version, units === "si" ? "reactions-si.csv" : "reactions.csv"),
    contentType: "text/csv; charset=utf-8",
    content: Buffer.from(text, "utf8"),
  };
}

/**
 * The calculation report. Dated with the revision's time, so the same revision (and section) gives
 * the same bytes. With `report`, it adds the member checks of a section, or says why there are none.
 */
export async function revisionPdf(ctx: RevisionContext, report: ReportChecks = null): Promise<RevisionFile> {
  const content = await renderCalculationReport({
    project: ctx.project.name,
    beam: ctx.beam.name,
    revision: ctx.revision.version,
    author: ctx.revision.author.name,
    checker: ctx.revision.checkedBy?.name ?? null,
    date: new Date(ctx.revision.createdAt),
    units: ctx.project.unitSystem,
    model: ctx.model,
    result: ctx.result,
    ...(report && "checks" in report ? { checks: report.checks.rows, checksBasis: report.checks.basis } : {}),
    ...(report && "omitted" in report ? { checksOmitted: report.omitted } : {}),
  });
  return {
    filename: exportFileName(ctx.beam.name, ctx.revision.version, "report.pdf"),
    contentType: "application/pdf",
    content,
  };
}
