import { and, desc, eq, sql } from "drizzle-orm";
import type { Db } from "../db/client.js";
import { auditEvents } from "../db/schema.js";

/**
 * The name a project section had when it was deleted, from the audit record of its deletion (the
 * only place it outlives the section); null when there is no such record.
 */
export async function findDeletedSectionName(db: Db, projectId: string, sectionId: string): Promise<string | null> {
  const [row] = await db
    .select({ name: sql<unknown>`${auditEvents.details} ->> 'name'` })
    .from(auditEvents)
    .where(and(eq(auditEvents.projectId, projectId), eq(auditEvents.action, "section.deleted"), sql`${auditEvents.details} ->> 'sectionId' = ${sectionId}`))
    .orderBy(desc(auditEvents.createdAt))
    .limit(1);
  return typeof row?.name === "string" ? row.name : null;
}
