import { beamDesignSettingsSchema, type BeamDesignSettings } from "@spanwright/contracts";
import { DEFLECTION_LIMIT_PRESETS, validateMaterial, validateSectionShape } from "@spanwright/solver/design";
import type { Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import { findSection } from "../sections/sections.repo.js";

/**
 * The rules the request schema cannot know: a typed shape and a material the design package
 * accepts (422 `invalid-section`, `details.field` naming the field, as for project sections), a
 * project section of this project and deflection presets the design package lists (400
 * `invalid-request` with `details.issues`, as a schema failure). Returns the settings to store,
 * with the shape and material as the design package parsed them.
 */
export async function checkDesignSettings(db: Db, projectId: string, settings: BeamDesignSettings): Promise<BeamDesignSettings> {
  let section = settings.section;
  if (section?.source === "typed") {
    const shape = validateSectionShape(section.shape);
    if (!shape.ok) throw new AppError("invalid-section", shape.error.message, { field: `designSettings.section.shape.${shape.error.field}` });
    section = { ...section, shape: { ...shape.value } };
  }
  let material = settings.material;
  if (material !== null) {
    const parsed = validateMaterial(material);
    if (!parsed.ok) throw new AppError("invalid-section", parsed.error.message, { field: `designSettings.material.${parsed.error.field}` });
    material = { ...parsed.value };
  }
  const issues: { path: string; message: string }[] = [];
  if (section?.source === "project" && !(await findSection(db, projectId, section.sectionId))) {
    issues.push({ path: "designSettings.section.sectionId", message: "no such section in this project" });
  }
  (settings.deflection ?? []).forEach((rule, i) => {
    if (rule.limit.kind === "preset" && !DEFLECTION_LIMIT_PRESETS.some((p) => p.id === (rule.limit as { presetId: string }).presetId)) {
      issues.push({ path: `designSettings.deflection.${i}.limit.presetId`, message: "unknown deflection preset" });
    }
  });
  const first = issues[0];
  if (first) throw new AppError("invalid-request", `body.${first.path}: ${first.message}`, { issues });
  return { ...settings, section, material };
}

/** Stored settings read back; anything that no longer parses (a hand-edited row) counts as none. */
export function readDesignSettings(stored: unknown): BeamDesignSettings | null {
  if (stored === null || stored === undefined) return null;
  const parsed = beamDesignSettingsSchema.safeParse(stored);
  return parsed.success ? parsed.data : null;
}
