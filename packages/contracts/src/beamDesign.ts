import { z } from "zod";
import { sectionIdSchema, sectionMaterialJsonSchema, sectionShapeJsonSchema } from "./sections.js";

/**
 * The design choices saved with a beam (issue 6): what its member checks use in the Checks tab
 * and, by default, in the PDF report. Kept beside the beam rather than in its model, since the
 * exchange format carries only stiffness. SI throughout (m, Pa). The shape and the material are
 * checked on the server with the design package's own rules; preset ids against its list.
 */
export const designMethodSchema = z.enum(["LRFD", "ASD"]);
export type DesignMethodChoice = z.infer<typeof designMethodSchema>;

/** How Cb is found for AISC 360-22 §F2: eq. F1-1 from the moment diagram, or 1.0 (conservative). */
export const cbRuleSchema = z.enum(["equation-f1-1", "unity"]);

const caseIdSchema = z.string().min(1).max(100);
const caseIdsSchema = z.array(caseIdSchema).max(200);
const positiveSi = z.number().finite().positive();

/** The section checked: a project section by id, or a shape typed for this beam. */
export const designSectionChoiceSchema = z.discriminatedUnion("source", [
  z.object({ source: z.literal("project"), sectionId: sectionIdSchema }).strict(),
  z.object({ source: z.literal("typed"), name: z.string().trim().min(1).max(120), shape: sectionShapeJsonSchema }).strict(),
]);
export type DesignSectionChoice = z.infer<typeof designSectionChoiceSchema>;

/** A deflection limit: a preset of the design package (IBC table) by id, or L/ratio typed by the user. */
export const designDeflectionLimitSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("preset"), presetId: z.string().min(1).max(60) }).strict(),
  z.object({ kind: z.literal("ratio"), ratio: positiveSi.max(100_000) }).strict(),
]);
export type DesignDeflectionLimit = z.infer<typeof designDeflectionLimitSchema>;

export const designDeflectionRuleSchema = z.object({ limit: designDeflectionLimitSchema, ids: caseIdsSchema }).strict();
export type DesignDeflectionRule = z.infer<typeof designDeflectionRuleSchema>;

export const beamDesignSettingsSchema = z
  .object({
    section: designSectionChoiceSchema.nullable(),
    /** The material checked; null: the project section's own. A typed section needs one. */
    material: sectionMaterialJsonSchema.nullable(),
    method: designMethodSchema,
    /** Unbraced length of the compression flange, m: braces every `lb` from each span's start; null: at the supports only. */
    lb: positiveSi.max(10_000).nullable(),
    cb: cbRuleSchema,
    /** Cases or combinations for the strength checks; null: every combination (the load cases when there are none). */
    strengthIds: caseIdsSchema.nullable(),
    /** Deflection limits and what each applies to; null: L/360 for live cases and L/240 for dead + live (IBC floor presets). */
    deflection: z.array(designDeflectionRuleSchema).max(20).nullable(),
    /** Allowable stresses of the elastic checks of sections other than steel I-shapes, Pa; null: none (the report uses 0.6·Fy and 0.4·Fy). */
    allowableBending: positiveSi.nullable(),
    allowableShear: positiveSi.nullable(),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.section?.source === "typed" && v.material === null) ctx.addIssue({ code: "custom", path: ["material"], message: "a typed section needs a material" });
  });
export type BeamDesignSettings = z.infer<typeof beamDesignSettingsSchema>;

/** Body of the design-settings route: the whole settings (they replace the saved ones), or null to clear them. */
export const updateBeamDesignRequestSchema = z.object({ designSettings: beamDesignSettingsSchema.nullable() }).strict();
export type UpdateBeamDesignRequest = z.infer<typeof updateBeamDesignRequestSchema>;
export const beamDesignResponseSchema = z.object({ designSettings: beamDesignSettingsSchema.nullable() });
export type BeamDesignResponse = z.infer<typeof beamDesignResponseSchema>;
