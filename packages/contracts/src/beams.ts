import { z } from "zod";
import { beamDesignSettingsSchema } from "./beamDesign.js";

export const beamIdSchema = z.string().uuid();
export const revisionStatusSchema = z.enum(["draft", "checked", "issued"]);
export type RevisionStatus = z.infer<typeof revisionStatusSchema>;

/**
 * A beam model in the exchange format (`spanwright.beam/1`). The API validates it with the
 * solver's own schema; here it is only an object so this package does not depend on the engine.
 */
export const beamModelJsonSchema = z.record(z.string(), z.unknown());
/** A solver result in the exchange format (`spanwright.result/1`). */
export const solveResultJsonSchema = z.record(z.string(), z.unknown());

const beamNameSchema = z.string().trim().min(1).max(120);
const changeSummarySchema = z.string().trim().max(2000);

export const revisionSummarySchema = z.object({
  version: z.number().int().positive(),
  author: z.object({ id: z.string(), name: z.string() }),
  createdAt: z.string(),
  changeSummary: z.string(),
  status: revisionStatusSchema,
  checkedBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  checkedAt: z.string().nullable(),
  checkComment: z.string().nullable(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

export const revisionSchema = revisionSummarySchema.extend({
  model: beamModelJsonSchema,
  result: solveResultJsonSchema,
});
export type Revision = z.infer<typeof revisionSchema>;

export const beamSchema = z.object({
  id: beamIdSchema,
  projectId: z.string(),
  name: beamNameSchema,
  latestVersion: z.number().int().positive(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Beam = z.infer<typeof beamSchema>;

export const createBeamRequestSchema = z.object({
  name: beamNameSchema,
  model: beamModelJsonSchema,
  changeSummary: changeSummarySchema.default("First revision"),
});
export type CreateBeamRequest = z.input<typeof createBeamRequestSchema>;
export const renameBeamRequestSchema = z.object({ name: beamNameSchema });
export type RenameBeamRequest = z.infer<typeof renameBeamRequestSchema>;

/**
 * A revision a client edited on top of. Versions are stored as 32-bit integers, and the next
 * version must fit too: a larger number names no revision and is refused as invalid input.
 */
export const baseVersionSchema = z.number().int().positive().max(2_147_483_646, "baseVersion must be at most 2147483646");

/** Save a new revision. `baseVersion` is the version the client edited; stale -> 409. */
export const saveRevisionRequestSchema = z.object({
  baseVersion: baseVersionSchema,
  model: beamModelJsonSchema,
  changeSummary: changeSummarySchema.default(""),
});
export type SaveRevisionRequest = z.input<typeof saveRevisionRequestSchema>;

export const checkRevisionRequestSchema = z.object({
  comment: z.string().trim().max(2000).optional(),
});
export type CheckRevisionRequest = z.infer<typeof checkRevisionRequestSchema>;

export const beamListResponseSchema = z.object({ beams: z.array(beamSchema) });
export type BeamListResponse = z.infer<typeof beamListResponseSchema>;
/**
 * Create (201) and get (200): the beam with its latest revision, and its saved design settings
 * (null: none saved yet; absent from answers that predate them, e.g. an import).
 */
export const beamResponseSchema = z.object({ beam: beamSchema, revision: revisionSchema, designSettings: beamDesignSettingsSchema.nullable().optional() });
export type BeamResponse = z.infer<typeof beamResponseSchema>;
export const revisionListResponseSchema = z.object({ revisions: z.array(revisionSummarySchema) });
export type RevisionListResponse = z.infer<typeof revisionListResponseSchema>;
export const revisionResponseSchema = z.object({ revision: revisionSchema });
export type RevisionResponse = z.infer<typeof revisionResponseSchema>;

/** `details` of a 409 `version-conflict`: the latest revision, so the client can show both. */
export const versionConflictDetailsSchema = z.object({ current: revisionSchema });
export type VersionConflictDetails = z.infer<typeof versionConflictDetailsSchema>;

export const healthResponseSchema = z.object({
  status: z.enum(["ok", "degraded"]),
  database: z.enum(["up", "down"]),
});
export type HealthResponse = z.infer<typeof healthResponseSchema>;
