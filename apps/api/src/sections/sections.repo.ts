import { and, asc, eq } from "drizzle-orm";
import type { Material, SectionShape } from "@spanwright/solver/design";
import type { Db } from "../db/client.js";
import { projectSections, users } from "../db/schema.js";

/** A stored project section before its properties are computed (the service adds them). */
export interface StoredSection {
  id: string;
  projectId: string;
  name: string;
  shape: SectionShape;
  material: Material;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  updatedAt: string;
}

const columns = {
  id: projectSections.id,
  projectId: projectSections.projectId,
  name: projectSections.name,
  shape: projectSections.shape,
  material: projectSections.material,
  createdAt: projectSections.createdAt,
  updatedAt: projectSections.updatedAt,
  creatorId: users.id,
  creatorName: users.name,
};

interface Row {
  id: string;
  projectId: string;
  name: string;
  shape: unknown;
  material: unknown;
  createdAt: Date;
  updatedAt: Date;
  creatorId: string | null;
  creatorName: string | null;
}

// jsonb columns hold values the service validated before writing them
const toSection = (r: Row): StoredSection => ({
  id: r.id,
  projectId: r.projectId,
  name: r.name,
  shape: r.shape as SectionShape,
  material: r.material as Material,
  createdBy: r.creatorId && r.creatorName !== null ? { id: r.creatorId, name: r.creatorName } : null,
  createdAt: r.createdAt.toISOString(),
  updatedAt: r.updatedAt.toISOString(),
});

function selectSections(db: Db) {
  return db.select(columns).from(projectSections).leftJoin(users, eq(users.id, projectSections.createdBy));
}

export async function listSections(db: Db, projectId: string): Promise<StoredSection[]> {
  const rows = await selectSections(db)
    .where(eq(projectSections.projectId, projectId))
    .orderBy(asc(projectSections.name), asc(projectSections.id));
  return rows.map(toSection);
}

/** The section only if it belongs to the project: an id from another project is "not found". */
export async function findSection(db: Db, projectId: string, sectionId: string): Promise<StoredSection | null> {
  const [row] = await selectSections(db).where(and(eq(projectSections.id, sectionId), eq(projectSections.projectId, projectId)));
  return row ? toSection(row) : null;
}

export async function insertSection(
  db: Db,
  values: { projectId: string; name: string; shape: SectionShape; material: Material; createdBy: string; now: Date },
): Promise<string> {
  const [row] = await db
    .insert(projectSections)
    .values({ ...values, createdAt: values.now, updatedAt: values.now })
    .returning({ id: projectSections.id });
  if (!row) throw new Error("insert project_sections returned no row");
  return row.id;
}

export async function updateSection(
  db: Db,
  sectionId: string,
  changes: { name?: string; shape?: SectionShape; material?: Material; now: Date },
): Promise<void> {
  const { now, ...rest } = changes;
  await db.update(projectSections).set({ ...rest, updatedAt: now }).where(eq(projectSections.id, sectionId));
}

export async function deleteSection(db: Db, sectionId: string): Promise<void> {
  await db.delete(projectSections).where(eq(projectSections.id, sectionId));
}
