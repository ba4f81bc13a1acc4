import type { BeamDesignSettings, ProjectSection, ReportQuery } from "@spanwright/contracts";
import { routePath } from "@spanwright/contracts/routes";

/** Lengths equal to 12 significant digits: 10 ft typed and converted may land an ulp from the saved metres. */
function sameLength(a: number, b: number | null): boolean {
  return b !== null && Number(a.toPrecision(12)) === Number(b.toPrecision(12));
}

export type ReportMethod = NonNullable<ReportQuery["method"]>;
export type ReportCb = NonNullable<ReportQuery["cb"]>;

/** The section choice that stands for the beam's saved typed section (a project section is chosen by its id). */
export const SAVED_TYPED_SECTION = "saved-typed";

/** What the revision page's report link lets the user choose; `lb` null: the field is empty. */
export interface ReportChoices {
  /** A project section id, or `SAVED_TYPED_SECTION`. */
  readonly section: string;
  readonly method: ReportMethod;
  /** Unbraced length, m; null leaves it to the report (the saved Lb, else braced at the supports only). */
  readonly lb: number | null;
  readonly cb: ReportCb;
}

/**
 * What the report prints when its link sets nothing (apps/api/src/exports/reportChecks.ts): the
 * beam's saved section with its saved material (null when none is saved or the saved project
 * section has been deleted: then the link must name one), method (LRFD when none is saved), Lb and
 * Cb (eq. F1-1 when none is saved).
 */
export interface ReportDefaults {
  readonly section: string | null;
  readonly method: ReportMethod;
  readonly lb: number | null;
  readonly cb: ReportCb;
}

export function reportDefaults(saved: BeamDesignSettings | null, sections: readonly Pick<ProjectSection, "id">[]): ReportDefaults {
  const choice = saved?.section ?? null;
  const section =
    choice === null ? null : choice.source === "typed" ? SAVED_TYPED_SECTION : sections.some((s) => s.id === choice.sectionId) ? choice.sectionId : null;
  return { section, method: saved?.method ?? "LRFD", lb: saved?.lb ?? null, cb: saved?.cb ?? "equation-f1-1" };
}

/**
 * The query of the report link: only the parts the user changed from what the report prints by
 * default, so the rest (and the saved material with the saved section) comes from the beam's
 * saved design settings. `defaults` null (the beam's settings could not be read) names every part.
 */
export function reportQuery(chosen: ReportChoices, defaults: ReportDefaults | null): ReportQuery {
  const query: { -readonly [K in keyof ReportQuery]: ReportQuery[K] } = {};
  if (chosen.section !== SAVED_TYPED_SECTION && chosen.section !== defaults?.section) query.sectionId = chosen.section;
  if (defaults === null || chosen.method !== defaults.method) query.method = chosen.method;
  if (chosen.lb !== null && (defaults === null || !sameLength(chosen.lb, defaults.lb))) query.lb = chosen.lb;
  if (defaults === null || chosen.cb !== defaults.cb) query.cb = chosen.cb;
  return query;
}

/** The revision's PDF report with that query (lb in m, in its shortest round-trip form). */
export function checksReportUrl(projectId: string, beamId: string, version: number, query: ReportQuery): string {
  const params = new URLSearchParams();
  if (query.sectionId !== undefined) params.set("sectionId", query.sectionId);
  if (query.method !== undefined) params.set("method", query.method);
  if (query.lb !== undefined) params.set("lb", String(query.lb));
  if (query.cb !== undefined) params.set("cb", query.cb);
  const path = routePath("getReportPdf", { projectId, beamId, version });
  const search = params.toString();
  return search === "" ? path : `${path}?${search}`;
}
