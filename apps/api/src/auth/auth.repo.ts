import { and, eq, isNull, lt, ne, sql } from "drizzle-orm";
import type { Db } from "../db/client.js";
import { preparedQuery } from "../db/preparedQuery.js";
import { sessions, users } from "../db/schema.js";

export interface UserRecord {
  id: string;
  email: string;
  name: string;
  /** null for a placeholder created by an invitation. */
  passwordHash: string | null;
  /** null for a placeholder, and for an account that took one over until it verifies its address. */
  emailVerifiedAt: Date | null;
}

export interface SessionRecord {
  id: string;
  userId: string;
  expiresAt: Date;
}

const userColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  passwordHash: users.passwordHash,
  emailVerifiedAt: users.emailVerifiedAt,
};

export async function findUserByEmail(db: Db, email: string): Promise<UserRecord | null> {
  const [row] = await db.select(userColumns).from(users).where(eq(users.email, email));
  return row ?? null;
}

export async function findUserById(db: Db, id: string): Promise<UserRecord | null> {
  const [row] = await db.select(userColumns).from(users).where(eq(users.id, id));
  return row ?? null;
}

export async function insertUser(
  db: Db,
  values: { email: string; name: string; passwordHash: string | null; emailVerifiedAt?: Date },
): Promise<UserRecord> {
  const [row] = await db.insert(users).values(values).returning(userColumns);
  if (!row) throw new Error("insert users returned no row");
  return row;
}

/**
 * Gives a placeholder account its owner's name and password; null if someone claimed it first. The
 * address stays unverified: signing up proves nothing about who reads its mail.
 */
export async function claimPlaceholderUser(
  db: Db,
  id: string,
  values: { name: string; passwordHash: string },
): Promise<UserRecord | null> {
  const [row] = await db
    .update(users)
    .set(values)
    .where(and(eq(users.id, id), isNull(users.passwordHash)))
    .returning(userColumns);
  return row ?? null;
}

export async function updatePasswordHash(db: Db, userId: string, passwordHash: string): Promise<void> {
  await db.update(users).set({ passwordHash }).where(eq(users.id, userId));
}

export async function insertSession(db: Db, session: SessionRecord): Promise<void> {
  await db.insert(sessions).values(session);
}

/** Run on every request with a session cookie: one indexed lookup, built once. */
const sessionWithUserQuery = preparedQuery((db) =>
  db
    .select({
      session: { id: sessions.id, userId: sessions.userId, expiresAt: sessions.expiresAt },
      user: userColumns,
    })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(eq(sessions.id, sql.placeholder("sessionId")))
    .prepare("find_session_with_user"),
);

export async function findSessionWithUser(
  db: Db,
  sessionId: string,
): Promise<{ session: SessionRecord; user: UserRecord } | null> {
  const [row] = await sessionWithUserQuery(db).execute({ sessionId });
  return row ?? null;
}

export async function updateSessionExpiry(db: Db, sessionId: string, expiresAt: Date): Promise<void> {
  await db.update(sessions).set({ expiresAt }).where(eq(sessions.id, sessionId));
}

export async function deleteSession(db: Db, sessionId: string): Promise<void> {
  await db.delete(sessions).where(eq(sessions.id, sessionId));
}

/** Deletes every session that expired before `now`; returns how many. */
export async function deleteExpiredSessions(db: Db, now: Date): Promise<number> {
  const rows = await db.delete(sessions).where(lt(sessions.expiresAt, now)).returning({ id: sessions.id });
  return rows.length;
}

export async function deleteOtherSessions(db: Db, userId: string, keepSessionId: string): Promise<void> {
  await db.delete(sessions).where(and(eq(sessions.userId, userId), ne(sessions.id, keepSessionId)));
}
