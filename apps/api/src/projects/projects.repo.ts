import { and, asc, eq } from "drizzle-orm";
import type { Project, Role, UnitSystem } from "@spanwright/contracts";
import type { Db } from "../db/client.js";
import { membershipCounts } from "../access/access.repo.js";
import { projectMembers, projects, users } from "../db/schema.js";

export interface ProjectSettings {
  name: string;
  unitSystem: UnitSystem;
  compareThresholdPercent: number;
}

const columns = {
  id: projects.id,
  name: projects.name,
  unitSystem: projects.unitSystem,
  compareThresholdPercent: projects.compareThresholdPercent,
  createdAt: projects.createdAt,
  updatedAt: projects.updatedAt,
};

type Row = { id: string; name: string; unitSystem: UnitSystem; compareThresholdPercent: number; createdAt: Date; updatedAt: Date };

const toProject = (row: Row, role: Role): Project => ({
  ...row,
  role,
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

export async function listProjectsForUser(db: Db, userId: string): Promise<Project[]> {
  const rows = await db
    .select({ ...columns, role: projectMembers.role })
    .from(projects)
    .innerJoin(projectMembers, eq(projectMembers.projectId, projects.id))
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.userId, userId), membershipCounts))
    .orderBy(asc(projects.name), asc(projects.id));
  return rows.map(({ role, ...row }) => toProject(row, role));
}

export async function findProjectForMember(db: Db, projectId: string, userId: string): Promise<Project | null> {
  const [row] = await db
    .select({ ...columns, role: projectMembers.role })
    .from(projects)
    .innerJoin(projectMembers, eq(projectMembers.projectId, projects.id))
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projects.id, projectId), eq(projectMembers.userId, userId), membershipCounts));
  if (!row) return null;
  const { role, ...rest } = row;
  return toProject(rest, role);
}

/** Creates the project with its creator as owner (not invited: the creator's membership always counts). */
export async function insertProject(db: Db, settings: ProjectSettings, ownerId: string): Promise<Project> {
  const [row] = await db.insert(projects).values(settings).returning(columns);
  if (!row) throw new Error("insert projects returned no row");
  await db.insert(projectMembers).values({ projectId: row.id, userId: ownerId, role: "owner", invited: false });
  return toProject(row, "owner");
}

export async function updateProject(db: Db, projectId: string, patch: Partial<ProjectSettings>, now: Date): Promise<void> {
  await db.update(projects).set({ ...patch, updatedAt: now }).where(eq(projects.id, projectId));
}

export async function deleteProject(db: Db, projectId: string): Promise<void> {
  await db.delete(projects).where(eq(projects.id, projectId));
}
