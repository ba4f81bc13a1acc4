import { and, eq } from "drizzle-orm";
import type { Role } from "@spanwright/contracts";
import type { Db } from "../db/client.js";
import { projectMembers } from "../db/schema.js";

export async function findRole(db: Db, projectId: string, userId: string): Promise<Role | null> {
  const [row] = await db
    .select({ role: projectMembers.role })
    .from(projectMembers)
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId)));
  return row?.role ?? null;
}
