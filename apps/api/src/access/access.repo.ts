import { and, eq, isNotNull, or, sql } from "drizzle-orm";
import type { Role } from "@spanwright/contracts";
import type { Db } from "../db/client.js";
import { preparedQuery } from "../db/preparedQuery.js";
import { projectMembers, users } from "../db/schema.js";

/**
 * Whether a membership row counts, for queries that join `users` on the member: one an owner's
 * invitation created counts only once the member's address is verified, so whoever signs up with an
 * invited address gets nothing before proving it is theirs. A project's creator needs no proof.
 */
export const membershipCounts = or(eq(projectMembers.invited, false), isNotNull(users.emailVerifiedAt));

const roleQuery = preparedQuery((db) =>
  db
    .select({ role: projectMembers.role })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(
      and(
        eq(projectMembers.projectId, sql.placeholder("projectId")),
        eq(projectMembers.userId, sql.placeholder("userId")),
        membershipCounts,
      ),
    )
    .prepare("find_role"),
);

/** The user's role in the project; null for a non-member and for a membership that does not count yet. */
export async function findRole(db: Db, projectId: string, userId: string): Promise<Role | null> {
  const [row] = await roleQuery(db).execute({ projectId, userId });
  return row?.role ?? null;
}
