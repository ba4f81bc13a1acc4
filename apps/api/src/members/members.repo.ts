import { and, asc, eq } from "drizzle-orm";
import type { Member, Role } from "@spanwright/contracts";
import type { Db } from "../db/client.js";
import { projectMembers, users } from "../db/schema.js";

const columns = {
  userId: projectMembers.userId,
  email: users.email,
  name: users.name,
  role: projectMembers.role,
  emailVerifiedAt: users.emailVerifiedAt,
  invited: projectMembers.invited,
  addedAt: projectMembers.createdAt,
};

type Row = { userId: string; email: string; name: string; role: Role; emailVerifiedAt: Date | null; invited: boolean; addedAt: Date };

// Pending: invited, and the address not yet proved (no account yet, or one that has not verified).
const toMember = ({ emailVerifiedAt, invited, addedAt, ...rest }: Row): Member => ({
  ...rest,
  pending: invited && emailVerifiedAt === null,
  addedAt: addedAt.toISOString(),
});

export async function listMembers(db: Db, projectId: string): Promise<Member[]> {
  const rows = await db
    .select(columns)
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(eq(projectMembers.projectId, projectId))
    .orderBy(asc(users.name), asc(users.email));
  return rows.map(toMember);
}

export async function findMember(db: Db, projectId: string, userId: string): Promise<Member | null> {
  const [row] = await db
    .select(columns)
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)));
  return row ? toMember(row) : null;
}

/** Inserts unless already a member; returns false when the pair existed. */
export async function insertMember(db: Db, projectId: string, userId: string, role: Role): Promise<boolean> {
  const rows = await db
    .insert(projectMembers)
    .values({ projectId, userId, role })
    .onConflictDoNothing()
    .returning({ userId: projectMembers.userId });
  return rows.length > 0;
}

export async function updateRole(db: Db, projectId: string, userId: string, role: Role): Promise<void> {
  await db
    .update(projectMembers)
    .set({ role })
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)));
}

export async function deleteMember(db: Db, projectId: string, userId: string): Promise<void> {
  await db
    .delete(projectMembers)
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)));
}

/**
 * The project's owners, row-locked until the transaction ends, so two owners demoting each other at
 * the same moment cannot leave the project without one.
 */
export async function lockOwners(db: Db, projectId: string): Promise<string[]> {
  const rows = await db
    .select({ userId: projectMembers.userId })
    .from(projectMembers)
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "owner")))
    .for("update");
  return rows.map((r) => r.userId);
}
