import { and, desc, eq, inArray, sql } from "drizzle-orm";
import type { Db } from "../db/client.js";
import { beamRevisions, beams, handoffRecipients, handoffs, projectMembers, users } from "../db/schema.js";

export interface HandoffRecord {
  id: string;
  projectId: string;
  beamId: string;
  beamName: string;
  beamLatestVersion: number;
  revisionId: string;
  version: number;
  issuedBy: { id: string; name: string };
  issuedAt: Date;
  message: string | null;
  messageId: string;
  recipients: Array<{ email: string; userId: string | null; name: string | null }>;
}

export interface MemberContact {
  userId: string;
  email: string;
  name: string;
  role: string;
}

/** Members of the project with these ids or e-mails (lower-cased), for resolving recipients. */
export async function findMemberContacts(db: Db, projectId: string, by: { userIds: string[]; emails: string[] }): Promise<MemberContact[]> {
  if (by.userIds.length === 0 && by.emails.length === 0) return [];
  const match = [
    ...(by.userIds.length ? [inArray(users.id, by.userIds)] : []),
    ...(by.emails.length ? [inArray(users.email, by.emails)] : []),
  ];
  return db
    .select({ userId: users.id, email: users.email, name: users.name, role: projectMembers.role })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), match.length === 1 ? match[0] : sql`(${match[0]} or ${match[1]})`));
}

export async function findUserName(db: Db, userId: string): Promise<string | null> {
  const [row] = await db.select({ name: users.name }).from(users).where(eq(users.id, userId));
  return row?.name ?? null;
}

/** Records a sent hand-off with its recipients; the caller runs this in a transaction. */
export async function insertHandoff(
  db: Db,
  values: { projectId: string; beamId: string; revisionId: string; issuedById: string; message: string | null; messageId: string; now: Date },
  recipients: Array<{ email: string; userId: string | null }>,
): Promise<string> {
  const [row] = await db
    .insert(handoffs)
    .values({ ...values, createdAt: values.now })
    .returning({ id: handoffs.id });
  if (!row) throw new Error("insert handoffs returned no row");
  await db.insert(handoffRecipients).values(recipients.map((r) => ({ handoffId: row.id, ...r })));
  return row.id;
}

/** draft or checked -> issued; an issued revision stays as it is (the trigger allows only this step). */
export async function markIssued(db: Db, revisionId: string): Promise<void> {
  await db
    .update(beamRevisions)
    .set({ status: "issued" })
    .where(and(eq(beamRevisions.id, revisionId), inArray(beamRevisions.status, ["draft", "checked"])));
}

/** Hand-offs of a project (or one beam of it), newest first. */
export async function listHandoffs(db: Db, projectId: string, beamId?: string): Promise<HandoffRecord[]> {
  const rows = await db
    .select({
      id: handoffs.id,
      projectId: handoffs.projectId,
      beamId: handoffs.beamId,
      beamName: beams.name,
      beamLatestVersion: beams.latestVersion,
      revisionId: handoffs.revisionId,
      version: beamRevisions.version,
      issuedById: handoffs.issuedById,
      issuedByName: users.name,
      issuedAt: handoffs.createdAt,
      message: handoffs.message,
      messageId: handoffs.messageId,
    })
    .from(handoffs)
    .innerJoin(beams, eq(beams.id, handoffs.beamId))
    .innerJoin(beamRevisions, eq(beamRevisions.id, handoffs.revisionId))
    .innerJoin(users, eq(users.id, handoffs.issuedById))
    .where(and(eq(handoffs.projectId, projectId), beamId ? eq(handoffs.beamId, beamId) : undefined))
    .orderBy(desc(handoffs.createdAt), desc(handoffs.id));
  if (rows.length === 0) return [];
  const recipientRows = await db
    .select({ handoffId: handoffRecipients.handoffId, email: handoffRecipients.email, userId: handoffRecipients.userId, name: users.name })
    .from(handoffRecipients)
    .leftJoin(users, eq(users.id, handoffRecipients.userId))
    .where(inArray(handoffRecipients.handoffId, rows.map((r) => r.id)))
    .orderBy(handoffRecipients.email);
  return rows.map(({ issuedById, issuedByName, ...r }) => ({
    ...r,
    issuedBy: { id: issuedById, name: issuedByName },
    recipients: recipientRows.filter((x) => x.handoffId === r.id).map(({ handoffId: _h, ...x }) => x),
  }));
}
