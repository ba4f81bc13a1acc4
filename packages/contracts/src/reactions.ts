import { z } from "zod";
import { unitSystemSchema } from "./projects.js";

/**
 * Reaction tables, comparisons and model diffs as the API sends them. Values are SI (N, N·m, m) with
 * contract signs: the force the support exerts on the beam, fy positive upward, mz positive
 * counterclockwise. `units` says how the project shows them: display = si / toSI.
 */

export const displayUnitSchema = z.object({ label: z.string(), toSI: z.number() });
export type DisplayUnitInfo = z.infer<typeof displayUnitSchema>;

export const projectUnitsSchema = z.object({
  system: unitSystemSchema,
  force: displayUnitSchema,
  moment: displayUnitSchema,
  length: displayUnitSchema,
});
export type ProjectUnits = z.infer<typeof projectUnitsSchema>;

export const supportTypeSchema = z.string();

export const reactionSupportSchema = z.object({
  node: z.number().int(),
  /** S1, S2, … in beam order. */
  label: z.string(),
  x: z.number(),
  support: supportTypeSchema,
});
export type ReactionSupport = z.infer<typeof reactionSupportSchema>;

const rowBase = {
  node: z.number().int(),
  label: z.string(),
  x: z.number(),
  support: supportTypeSchema,
  /** Load case id, combination id, or for envelopes the combination id or "*" (all combinations). */
  id: z.string(),
  /** The support pulls the beam down (fy < 0, or fyMin < 0 for envelopes). */
  uplift: z.boolean(),
};

export const reactionRowSchema = z.discriminatedUnion("kind", [
  z.object({ ...rowBase, kind: z.literal("case"), category: z.string(), fy: z.number(), mz: z.number() }),
  z.object({ ...rowBase, kind: z.literal("combination"), fy: z.number(), mz: z.number() }),
  z.object({
    ...rowBase,
    kind: z.literal("envelope"),
    fyMax: z.number(),
    fyMin: z.number(),
    mzMax: z.number(),
    mzMin: z.number(),
  }),
]);
export type ReactionRowJson = z.infer<typeof reactionRowSchema>;

export const reactionTableSchema = z.object({
  supports: z.array(reactionSupportSchema),
  rows: z.array(reactionRowSchema),
});
export type ReactionTableJson = z.infer<typeof reactionTableSchema>;

/** GET …/revisions/:version/reactions */
export const reactionTableResponseSchema = z.object({
  version: z.number().int().positive(),
  units: projectUnitsSchema,
  table: reactionTableSchema,
  /** Labels of supports with uplift in any row, for the warning above the table. */
  upliftSupports: z.array(z.string()),
});
export type ReactionTableResponse = z.infer<typeof reactionTableResponseSchema>;

/** `units` query of …/reactions.csv: the project's display units (default) or the SI machine variant. */
export const reactionCsvQuerySchema = z.object({ units: z.enum(["project", "si"]).default("project") });
export type ReactionCsvQuery = z.infer<typeof reactionCsvQuerySchema>;

export const reactionQuantitySchema = z.enum(["fy", "mz", "fyMax", "fyMin", "mzMax", "mzMin"]);

export const valueChangeSchema = z.object({
  x: z.number(),
  label: z.string(),
  kind: z.enum(["case", "combination", "envelope"]),
  id: z.string(),
  quantity: reactionQuantitySchema,
  before: z.number().nullable(),
  after: z.number().nullable(),
  change: z.number().nullable(),
  /** Relative to the older value; null when there is none or it is zero. */
  changePct: z.number().nullable(),
  /** Beyond the project's threshold, or appeared/disappeared. */
  flagged: z.boolean(),
});
export type ValueChangeJson = z.infer<typeof valueChangeSchema>;

export const supportMatchSchema = z.object({
  x: z.number(),
  before: reactionSupportSchema.nullable(),
  after: reactionSupportSchema.nullable(),
  status: z.enum(["kept", "type-changed", "added", "removed"]),
});
export type SupportMatchJson = z.infer<typeof supportMatchSchema>;

/** One structured model change (see @spanwright/handoff `ModelChange`); `kind` names it. */
export const modelChangeSchema = z.object({ kind: z.string() }).catchall(z.unknown());
export type ModelChangeJson = z.infer<typeof modelChangeSchema>;

export const modelDiffSchema = z.object({
  changes: z.array(modelChangeSchema),
  /** One line per change in the project's units, e.g. "L: +2 kN/m on span 2". */
  summary: z.array(z.string()),
});
export type ModelDiffJson = z.infer<typeof modelDiffSchema>;

/** `from` and `to` of …/revisions/compare (any order is allowed; `from` is the older side). */
export const compareQuerySchema = z.object({
  from: z.coerce.number().int().positive(),
  to: z.coerce.number().int().positive(),
});
export type CompareQuery = z.infer<typeof compareQuerySchema>;

/** GET …/revisions/compare?from=A&to=B */
export const compareResponseSchema = z.object({
  from: z.number().int().positive(),
  to: z.number().int().positive(),
  thresholdPercent: z.number(),
  units: projectUnitsSchema,
  before: reactionTableSchema,
  after: reactionTableSchema,
  supports: z.array(supportMatchSchema),
  values: z.array(valueChangeSchema),
  flaggedCount: z.number().int(),
  modelDiff: modelDiffSchema,
});
export type CompareResponse = z.infer<typeof compareResponseSchema>;
