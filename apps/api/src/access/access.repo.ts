import { and, eq, sql } from "drizzle-orm";
import type { Role } from "@spanwright/contracts";
import type { Db } from "../db/client.js";
import { preparedQuery } from "../db/preparedQuery.js";
import { projectMembers } from "../db/schema.js";

const roleQuery = preparedQuery((db) =>
  db
    .select({ role: projectMembers.role })
    .from(projectMembers)
    .where(and(eq(projectMembers.projectId, sql.placeholder("projectId")), eq(projectMembers.userId, sql.placeholder("userId"))))
    .prepare("find_role"),
);

export async function findRole(db: Db, projectId: string, userId: string): Promise<Role | null> {
  const [row] = await roleQuery(db).execute({ projectId, userId });
  return row?.role ?? null;
}
