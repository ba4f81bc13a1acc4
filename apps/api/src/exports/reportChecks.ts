import type { BeamDesignSettings, DesignDeflectionLimit, ReportQuery } from "@spanwright/contracts";
import { DEFLECTION_LIMIT_PRESETS, validateMaterial, validateSectionShape, type DeflectionLimit } from "@spanwright/solver/design";
import { findDesignSettings } from "../beams/beams.repo.js";
import { readDesignSettings } from "../beams/designSettings.js";
import type { Db } from "../db/client.js";
import type { RevisionContext } from "../revisions/revisionContext.js";
import { findSection } from "../sections/sections.repo.js";
import type { SectionsService } from "../sections/sections.service.js";
import { findDeletedSectionName } from "./exports.repo.js";
import { memberChecks, type CheckedSection, type DeflectionRuleChoice, type MemberChecks } from "./memberChecks.js";

/**
 * What the report prints under "Member checks": the checks; why there are none although the saved
 * settings chose a section (`omitted`, one sentence); or nothing when no section was chosen.
 */
export type ReportChecks = { readonly checks: MemberChecks } | { readonly omitted: string } | null;

function limitOf(limit: DesignDeflectionLimit): DeflectionLimit | null {
  if (limit.kind === "ratio") return { kind: "ratio", ratio: limit.ratio };
  const preset = DEFLECTION_LIMIT_PRESETS.find((p) => p.id === limit.presetId);
  return preset ? { kind: "preset", preset } : null;
}

/** The saved deflection rules as check limits; null keeps the report's defaults. */
function deflectionRules(saved: BeamDesignSettings | null): DeflectionRuleChoice[] | null {
  if (!saved?.deflection) return null;
  return saved.deflection.flatMap((r) => {
    const limit = limitOf(r.limit);
    return limit ? [{ limit, ids: r.ids }] : [];
  });
}

/** The sentence the report prints instead of checks whose saved project section was deleted. */
async function deletedSectionSentence(db: Db, projectId: string, sectionId: string): Promise<string> {
  const name = await findDeletedSectionName(db, projectId, sectionId);
  const section = name === null ? `The project section ${sectionId}` : `The project section "${name}"`;
  return `${section} chosen in this beam's design settings has been deleted from the project, so no member checks are printed; choose another section in the beam's design settings.`;
}

/**
 * The section the report checks: the query's project section (with its own material), else the
 * saved choice (a project section, with the saved material when one was chosen, or a typed
 * shape); null when there is none; `missing` when the saved project section has since been deleted.
 */
async function checkedSection(
  db: Db,
  sections: SectionsService,
  userId: string,
  projectId: string,
  saved: BeamDesignSettings | null,
  query: ReportQuery,
): Promise<CheckedSection | { missing: string } | null> {
  if (query.sectionId) return sections.get(userId, projectId, query.sectionId);
  const choice = saved?.section ?? null;
  if (choice === null) return null;
  const material = saved?.material ? validateMaterial(saved.material) : null;
  if (material && !material.ok) return null;
  if (choice.source === "project") {
    const section = await findSection(db, projectId, choice.sectionId);
    if (!section) return { missing: choice.sectionId };
    return material ? { ...section, material: material.value } : section;
  }
  const shape = validateSectionShape(choice.shape);
  return shape.ok && material ? { name: choice.name, shape: shape.value, material: material.value } : null;
}

/**
 * The member checks printed in a revision's PDF report: the beam's saved design settings (method,
 * Lb, Cb, cases, deflection limits, allowables), each part replaced by the query's when given.
 * Null when neither names a section: the report then has no member checks.
 */
export async function reportChecks(db: Db, sections: SectionsService, userId: string, ctx: RevisionContext, query: ReportQuery): Promise<ReportChecks> {
  const saved = readDesignSettings(await findDesignSettings(db, ctx.beam.id));
  const section = await checkedSection(db, sections, userId, ctx.beam.projectId, saved, query);
  if (!section) return null;
  if ("missing" in section) return { omitted: await deletedSectionSentence(db, ctx.beam.projectId, section.missing) };
  const checks = memberChecks(ctx.model, section, {
    method: query.method ?? saved?.method ?? "LRFD",
    Lb: query.lb ?? saved?.lb ?? null,
    ...(query.cb ?? saved?.cb ? { cb: query.cb ?? saved!.cb } : {}),
    strengthIds: saved?.strengthIds ?? null,
    deflection: deflectionRules(saved),
    allowableBending: saved?.allowableBending ?? null,
    allowableShear: saved?.allowableShear ?? null,
  });
  return { checks };
}
