import { and, asc, eq } from "drizzle-orm";
import type { Beam, BeamDesignSettings } from "@spanwright/contracts";
import type { Db } from "../db/client.js";
import { beams } from "../db/schema.js";

const columns = {
  id: beams.id,
  projectId: beams.projectId,
  name: beams.name,
  latestVersion: beams.latestVersion,
  createdAt: beams.createdAt,
  updatedAt: beams.updatedAt,
};

type Row = { id: string; projectId: string; name: string; latestVersion: number; createdAt: Date; updatedAt: Date };

const toBeam = (r: Row): Beam => ({ ...r, createdAt: r.createdAt.toISOString(), updatedAt: r.updatedAt.toISOString() });

export async function listBeams(db: Db, projectId: string): Promise<Beam[]> {
  const rows = await db.select(columns).from(beams).where(eq(beams.projectId, projectId)).orderBy(asc(beams.name), asc(beams.id));
  return rows.map(toBeam);
}

/** The beam only if it belongs to the project: an id from another project is "not found". */
export async function findBeam(db: Db, projectId: string, beamId: string): Promise<Beam | null> {
  const [row] = await db.select(columns).from(beams).where(and(eq(beams.id, beamId), eq(beams.projectId, projectId)));
  return row ? toBeam(row) : null;
}

export async function insertBeam(db: Db, values: { projectId: string; name: string; now: Date }): Promise<Beam> {
  const [row] = await db
    .insert(beams)
    .values({ projectId: values.projectId, name: values.name, latestVersion: 1, createdAt: values.now, updatedAt: values.now })
    .returning(columns);
  if (!row) throw new Error("insert beams returned no row");
  return toBeam(row);
}

export async function renameBeam(db: Db, beamId: string, name: string, now: Date): Promise<void> {
  await db.update(beams).set({ name, updatedAt: now }).where(eq(beams.id, beamId));
}

export async function deleteBeam(db: Db, beamId: string): Promise<void> {
  await db.delete(beams).where(eq(beams.id, beamId));
}

/** The beam's saved design settings as stored (validated when written); null when none. */
export async function findDesignSettings(db: Db, beamId: string): Promise<unknown> {
  const [row] = await db.select({ designSettings: beams.designSettings }).from(beams).where(eq(beams.id, beamId));
  return row?.designSettings ?? null;
}

export async function setDesignSettings(db: Db, beamId: string, settings: BeamDesignSettings | null, now: Date): Promise<void> {
  await db.update(beams).set({ designSettings: settings, updatedAt: now }).where(eq(beams.id, beamId));
}
