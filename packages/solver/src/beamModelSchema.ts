import { z } from "zod";

// Units are SI base units throughout (N, m, Pa, m², m⁴, N/m, N·m, rad); y up, CCW positive.
// Objects are strict so a misspelt key (e.g. "hindge") fails instead of being silently ignored.

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();

export const supportSchema = z.discriminatedUnion("type", [
  z.strictObject({ type: z.literal("pinned") }),
  z.strictObject({ type: z.literal("fixed") }),
  z.strictObject({ type: z.literal("guided") }),
  z.strictObject({ type: z.literal("spring"), ky: nonNegative.optional(), kr: nonNegative.optional() }),
]);

export const nodeSchema = z.strictObject({
  x: z.number(),
  support: supportSchema.optional(),
  hinge: z.boolean().optional(),
});

export const segmentSchema = z.strictObject({
  E: positive,
  I: positive,
  A: positive.optional(),
  G: positive.optional(),
  shearFactor: positive.optional(),
});

export const loadSchema = z.discriminatedUnion("type", [
  z.strictObject({ type: z.literal("point"), x: z.number(), fy: z.number() }),
  z.strictObject({ type: z.literal("moment"), x: z.number(), mz: z.number() }),
  z.strictObject({
    type: z.literal("distributed"),
    x1: z.number(),
    x2: z.number(),
    qy1: z.number(),
    qy2: z.number(),
  }),
  z.strictObject({ type: z.literal("settlement"), node: z.number().int().nonnegative(), uy: z.number() }),
]);

export const loadCategorySchema = z.enum([
  "dead",
  "live",
  "roof-live",
  "snow",
  "rain",
  "wind",
  "earthquake",
  "settlement",
  "other",
]);

export const loadCaseSchema = z.strictObject({
  id: z.string().min(1),
  category: loadCategorySchema,
  pattern: z.boolean().optional(),
  loads: z.array(loadSchema),
});

export const combinationSchema = z.strictObject({
  id: z.string().min(1),
  factors: z.record(z.string(), z.number()),
});

/** The zod schema of the exchange format's model (`spanwright.beam/1`): the source of truth in code. */
export const beamModelSchema = z.strictObject({
  format: z.literal("spanwright.beam/1"),
  title: z.string().optional(),
  theory: z.enum(["euler-bernoulli", "timoshenko"]).default("euler-bernoulli"),
  nodes: z.array(nodeSchema).min(2),
  segments: z.array(segmentSchema),
  loadCases: z.array(loadCaseSchema).default([]),
  combinations: z.array(combinationSchema).default([]),
  stations: z.array(z.number()).optional(),
});

/** A validated beam model (defaults applied: `theory`, `loadCases`, `combinations`). */
export type BeamModel = z.infer<typeof beamModelSchema>;
/** The model as written in JSON, before defaults. */
export type BeamModelInput = z.input<typeof beamModelSchema>;
export type BeamNode = z.infer<typeof nodeSchema>;
export type Segment = z.infer<typeof segmentSchema>;
export type Support = z.infer<typeof supportSchema>;
export type SupportType = Support["type"];
export type Load = z.infer<typeof loadSchema>;
export type LoadCategory = z.infer<typeof loadCategorySchema>;
export type LoadCase = z.infer<typeof loadCaseSchema>;
export type Combination = z.infer<typeof combinationSchema>;
export type Theory = BeamModel["theory"];
