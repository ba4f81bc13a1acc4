import { and, eq, lt, sql } from "drizzle-orm";
import type { Db } from "../db/client.js";
import { emailVerifications, users } from "../db/schema.js";

export interface EmailVerificationRecord {
  /** Hex SHA-256 of the token in the link. */
  id: string;
  userId: string;
  email: string;
  expiresAt: Date;
}

/** Stores a new link and drops the user's earlier ones: only the newest link works. */
export async function replaceEmailVerification(db: Db, record: EmailVerificationRecord): Promise<void> {
  await db.delete(emailVerifications).where(eq(emailVerifications.userId, record.userId));
  await db.insert(emailVerifications).values(record);
}

/** Deletes and returns the link with this id (each link works once); null when unknown. */
export async function takeEmailVerification(db: Db, id: string): Promise<EmailVerificationRecord | null> {
  const [row] = await db
    .delete(emailVerifications)
    .where(eq(emailVerifications.id, id))
    .returning({
      id: emailVerifications.id,
      userId: emailVerifications.userId,
      email: emailVerifications.email,
      expiresAt: emailVerifications.expiresAt,
    });
  return row ?? null;
}

/**
 * Marks the user's address verified, if it is still `email` (the link proves that address only).
 * Returns false when the user is gone or has another address.
 */
export async function markEmailVerified(db: Db, userId: string, email: string, at: Date): Promise<boolean> {
  const updated = await db
    .update(users)
    .set({ emailVerifiedAt: sql`coalesce(${users.emailVerifiedAt}, ${at.toISOString()}::timestamptz)` })
    .where(and(eq(users.id, userId), eq(users.email, email)))
    .returning({ id: users.id });
  if (updated.length > 0) {
    await db.delete(emailVerifications).where(eq(emailVerifications.userId, userId));
  }
  return updated.length > 0;
}

/** Deletes the links that expired before `now`; returns how many. */
export async function deleteExpiredEmailVerifications(db: Db, now: Date): Promise<number> {
  const rows = await db.delete(emailVerifications).where(lt(emailVerifications.expiresAt, now)).returning({ id: emailVerifications.id });
  return rows.length;
}
