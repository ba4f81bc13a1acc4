import { z } from "zod";

/**
 * Uploads (multipart/form-data, one file in the field `file`):
 * - POST …/beams/import: a beam model in the exchange format (JSON), optional text field `name`;
 *   answers 201 with `BeamResponse`.
 * - POST …/beams/:beamId/load-schedule/preview: a load schedule CSV (columns case, type, position,
 *   magnitude, values with units); answers 200 `LoadSchedulePreviewResponse`, writes nothing.
 * - POST …/beams/:beamId/load-schedule/apply: the same CSV plus the text field `baseVersion`;
 *   answers 201 `RevisionResponse` only when the schedule has no errors, else 422
 *   `invalid-schedule` with `details.errors` (nothing written).
 * Over `uploadLimits.fileBytes`: 413 `file-too-large`. Not JSON / not CSV: 422 `invalid-file`.
 */
export const uploadLimits = { fileBytes: 2_000_000, files: 1, fieldName: "file" } as const;

export const scheduleErrorSchema = z.object({
  /** Line in the file, header = 1, as a spreadsheet shows it; 0 for whole-file problems. */
  row: z.number().int(),
  column: z.enum(["case", "type", "position", "magnitude"]).nullable(),
  /** e.g. wrong-columns, unknown-unit, out-of-range, unknown-case, not-a-number. */
  code: z.string(),
  message: z.string(),
});
export type ScheduleErrorJson = z.infer<typeof scheduleErrorSchema>;

export const scheduleLoadSchema = z.object({ type: z.string() }).catchall(z.unknown());

export const loadSchedulePreviewSchema = z.object({
  rows: z.array(z.object({ row: z.number().int(), caseId: z.string(), load: scheduleLoadSchema })),
  cases: z.array(z.object({ id: z.string(), willCreate: z.boolean(), loads: z.array(scheduleLoadSchema) })),
});

export const loadSchedulePreviewResponseSchema = z.object({
  ok: z.boolean(),
  preview: loadSchedulePreviewSchema,
  errors: z.array(scheduleErrorSchema),
});
export type LoadSchedulePreviewResponse = z.infer<typeof loadSchedulePreviewResponseSchema>;
