import { z } from "zod";
import { userIdSchema } from "./auth.js";

/**
 * Hand-offs: a revision's reaction table (CSV) and calculation report (PDF) e-mailed to the
 * foundation designer. Recipients are project members with the viewer role or external addresses.
 */

export const handoffRecipientInputSchema = z.union([
  z.object({ userId: userIdSchema }).strict(),
  z.object({ email: z.string().trim().toLowerCase().email().max(254) }).strict(),
]);
export type HandoffRecipientInput = z.infer<typeof handoffRecipientInputSchema>;

/** POST …/revisions/:version/handoffs */
export const createHandoffRequestSchema = z.object({
  recipients: z.array(handoffRecipientInputSchema).min(1).max(20),
  message: z.string().trim().max(2000).optional(),
});
export type CreateHandoffRequest = z.infer<typeof createHandoffRequestSchema>;

export const handoffRecipientSchema = z.object({
  email: z.string(),
  /** Set when the recipient is a project member. */
  userId: z.string().nullable(),
  name: z.string().nullable(),
  /**
   * This recipient holds outdated reactions: the hand-off is stale and the recipient has had no
   * later hand-off of the same beam. Always sent by the API.
   */
  outdated: z.boolean().optional(),
});
export type HandoffRecipient = z.infer<typeof handoffRecipientSchema>;

export const handoffSchema = z.object({
  id: z.string(),
  projectId: z.string(),
  beamId: z.string(),
  beamName: z.string(),
  /** The issued revision. */
  version: z.number().int().positive(),
  issuedBy: z.object({ id: z.string(), name: z.string() }),
  issuedAt: z.string(),
  message: z.string().nullable(),
  /** Message-ID the SMTP server accepted. */
  messageId: z.string(),
  recipients: z.array(handoffRecipientSchema),
  /** The beam's latest revision now, for "compare" and "re-issue" links. */
  latestVersion: z.number().int().positive(),
  /**
   * A newer revision changes an issued reaction beyond the project's threshold (or adds/removes a
   * support): the recipients hold outdated numbers.
   */
  stale: z.boolean(),
  /** How many issued values the latest revision changes beyond the threshold. */
  staleValueCount: z.number().int(),
});
export type Handoff = z.infer<typeof handoffSchema>;

export const handoffResponseSchema = z.object({ handoff: handoffSchema });
export type HandoffResponse = z.infer<typeof handoffResponseSchema>;
/** Newest first. */
export const handoffListResponseSchema = z.object({ handoffs: z.array(handoffSchema) });
export type HandoffListResponse = z.infer<typeof handoffListResponseSchema>;

/** GET /api/outbox: messages caught by the local SMTP fake (development and tests only). */
export const outboxMessageSchema = z.object({
  id: z.number().int(),
  receivedAt: z.string(),
  messageId: z.string().nullable(),
  from: z.string().nullable(),
  to: z.array(z.string()),
  subject: z.string().nullable(),
  text: z.string().nullable(),
  attachments: z.array(z.object({ filename: z.string().nullable(), contentType: z.string(), size: z.number().int() })),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
/** Newest first. */
export const outboxResponseSchema = z.object({ messages: z.array(outboxMessageSchema) });
export type OutboxResponse = z.infer<typeof outboxResponseSchema>;
