import { z } from "zod";

/**
 * Project sections: one named cross-section with its material, reused by any beam of the project.
 * The shape and the material are checked on the server with the design package's own schemas
 * (`SectionShape`, `Material` of @spanwright/solver/design); here they are only objects, so this
 * package does not depend on the engine. SI throughout: m, m², m³, m⁴, Pa, kg/m³.
 */
export const sectionIdSchema = z.string().uuid();
export const sectionShapeJsonSchema = z.record(z.string(), z.unknown());
export const sectionMaterialJsonSchema = z.record(z.string(), z.unknown());

const sectionNameSchema = z.string().trim().min(1).max(120);

/** Strong-axis properties computed by the engine from the shape (`SectionProperties`), SI. */
export const sectionPropertiesJsonSchema = z.object({
  kind: z.string(),
  A: z.number(),
  I: z.number(),
  depth: z.number(),
  yTop: z.number(),
  Stop: z.number(),
  Sbot: z.number(),
  Z: z.number().nullable(),
  yPlastic: z.number().nullable(),
  Q: z.number().nullable(),
  bNA: z.number().nullable(),
  shearArea: z.number().nullable(),
  shearFactor: z.number().nullable(),
  shearAreaBasis: z.string(),
});
export type SectionPropertiesJson = z.infer<typeof sectionPropertiesJsonSchema>;

export const projectSectionSchema = z.object({
  id: sectionIdSchema,
  projectId: z.string(),
  name: sectionNameSchema,
  shape: sectionShapeJsonSchema,
  material: sectionMaterialJsonSchema,
  sectionProperties: sectionPropertiesJsonSchema,
  createdBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type ProjectSection = z.infer<typeof projectSectionSchema>;

export const createSectionRequestSchema = z.object({
  name: sectionNameSchema,
  shape: sectionShapeJsonSchema,
  material: sectionMaterialJsonSchema,
});
export type CreateSectionRequest = z.infer<typeof createSectionRequestSchema>;

/** Any subset; a new shape or material replaces the old one whole. */
export const updateSectionRequestSchema = createSectionRequestSchema
  .partial()
  .refine((v) => v.name !== undefined || v.shape !== undefined || v.material !== undefined, { message: "nothing to change" });
export type UpdateSectionRequest = z.infer<typeof updateSectionRequestSchema>;

export const sectionListResponseSchema = z.object({ sections: z.array(projectSectionSchema) });
export type SectionListResponse = z.infer<typeof sectionListResponseSchema>;
export const sectionResponseSchema = z.object({ section: projectSectionSchema });
export type SectionResponse = z.infer<typeof sectionResponseSchema>;

/**
 * Query of the calculation report. The beam's saved design settings (`BeamDesignSettings`) are the
 * base; each parameter given replaces its part of them: `sectionId` names the project section
 * whose member checks it prints (with that section's own material); `method` says how the model's
 * combinations are read (AISC 360-22 §B3: LRFD or ASD); `lb` is the unbraced length of the
 * compression flange in metres, braces every `lb` from the start of each span; `cb` how Cb is found.
 * Without saved settings and without `sectionId` the report has no checks (revisions do not store
 * sections); without a saved or given method it is LRFD, without `lb` braced at the supports only.
 * Query strings arrive as text, hence the coercion.
 */
export const reportQuerySchema = z.object({
  sectionId: sectionIdSchema.optional(),
  method: z.enum(["LRFD", "ASD"]).optional(),
  lb: z.coerce.number().positive().finite().optional(),
  cb: z.enum(["equation-f1-1", "unity"]).optional(),
});
export type ReportQuery = z.infer<typeof reportQuerySchema>;
