import type { Db } from "../db/client.js";
import { auditEvents } from "../db/schema.js";

/** What happened, for the record: `project.created`, `member.role-changed`, `revision.saved` ... */
export type AuditAction =
  | "user.signed-up"
  | "user.password-changed"
  | "user.email-verified"
  | "project.created"
  | "project.updated"
  | "project.deleted"
  | "member.invited"
  | "member.role-changed"
  | "member.removed"
  | "beam.created"
  | "beam.renamed"
  | "beam.deleted"
  | "beam.design-settings-saved"
  | "revision.saved"
  | "revision.checked"
  | "revision.issued"
  | "section.created"
  | "section.updated"
  | "section.deleted";

export async function recordAudit(
  db: Db,
  event: { projectId: string | null; actorId: string | null; action: AuditAction; details?: Record<string, unknown> },
): Promise<void> {
  await db.insert(auditEvents).values({ ...event, details: event.details ?? {} });
}
