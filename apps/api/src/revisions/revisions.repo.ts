import { randomUUID } from "node:crypto";
import { and, desc, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Revision, RevisionSummary, UnitSystem } from "@spanwright/contracts";
import type { AuditAction } from "../audit/audit.repo.js";
import type { Db } from "../db/client.js";
import { beamRevisions, beams, projects, revisionResults, users } from "../db/schema.js";

const checker = alias(users, "checker");

const summaryColumns = {
  id: beamRevisions.id,
  version: beamRevisions.version,
  authorId: beamRevisions.authorId,
  authorName: users.name,
  createdAt: beamRevisions.createdAt,
  changeSummary: beamRevisions.changeSummary,
  status: beamRevisions.status,
  checkedById: beamRevisions.checkedById,
  checkedByName: checker.name,
  checkedAt: beamRevisions.checkedAt,
  checkComment: beamRevisions.checkComment,
};

type SummaryRow = {
  id: string;
  version: number;
  authorId: string;
  authorName: string;
  createdAt: Date;
  changeSummary: string;
  status: RevisionSummary["status"];
  checkedById: string | null;
  checkedByName: string | null;
  checkedAt: Date | null;
  checkComment: string | null;
};

const toSummary = (r: SummaryRow): RevisionSummary => ({
  version: r.version,
  author: { id: r.authorId, name: r.authorName },
  createdAt: r.createdAt.toISOString(),
  changeSummary: r.changeSummary,
  status: r.status,
  checkedBy: r.checkedById ? { id: r.checkedById, name: r.checkedByName ?? "" } : null,
  checkedAt: r.checkedAt ? r.checkedAt.toISOString() : null,
  checkComment: r.checkComment,
});

export async function listRevisions(db: Db, beamId: string): Promise<RevisionSummary[]> {
  const rows = await db
    .select(summaryColumns)
    .from(beamRevisions)
    .innerJoin(users, eq(users.id, beamRevisions.authorId))
    .leftJoin(checker, eq(checker.id, beamRevisions.checkedById))
    .where(eq(beamRevisions.beamId, beamId))
    .orderBy(desc(beamRevisions.version));
  return rows.map(toSummary);
}

/** One revision with its model and stored result, plus its row id for follow-up writes. */
export async function findRevision(db: Db, beamId: string, version: number): Promise<(Revision & { id: string }) | null> {
  const [row] = await db
    .select({ ...summaryColumns, model: beamRevisions.model, result: revisionResults.result })
    .from(beamRevisions)
    .innerJoin(users, eq(users.id, beamRevisions.authorId))
    .innerJoin(revisionResults, eq(revisionResults.revisionId, beamRevisions.id))
    .leftJoin(checker, eq(checker.id, beamRevisions.checkedById))
    .where(and(eq(beamRevisions.beamId, beamId), eq(beamRevisions.version, version)));
  if (!row) return null;
  return {
    id: row.id,
    ...toSummary(row),
    model: row.model as Record<string, unknown>,
    result: row.result as Record<string, unknown>,
  };
}

/**
 * What a save needs besides the caller's role, in one round trip: that the beam is in the project,
 * the project's unit system, the author's name and the base revision's model (null if that
 * revision does not exist). Null when the beam is not in the project.
 */
export async function findSaveContext(
  db: Db,
  ids: { projectId: string; beamId: string; baseVersion: number; authorId: string },
): Promise<{ unitSystem: UnitSystem; authorName: string | null; baseModel: Record<string, unknown> | null } | null> {
  const [row] = await db
    .select({ unitSystem: projects.unitSystem, authorName: users.name, baseModel: beamRevisions.model })
    .from(beams)
    .innerJoin(projects, eq(projects.id, beams.projectId))
    .leftJoin(users, eq(users.id, ids.authorId))
    .leftJoin(beamRevisions, and(eq(beamRevisions.beamId, beams.id), eq(beamRevisions.version, ids.baseVersion)))
    .where(and(eq(beams.id, ids.beamId), eq(beams.projectId, ids.projectId)));
  if (!row) return null;
  return { unitSystem: row.unitSystem, authorName: row.authorName, baseModel: (row.baseModel as Record<string, unknown> | null) ?? null };
}

/**
 * Writes a revision and its result; the caller runs this inside the transaction that bumped the
 * version. The row id is made here, so both inserts go to the server in one write (the driver
 * pipelines them; the server runs them in order).
 */
export async function insertRevisionWithResult(
  db: Db,
  values: { beamId: string; version: number; model: unknown; result: unknown; authorId: string; changeSummary: string; now: Date },
): Promise<void> {
  const id = randomUUID();
  await Promise.all([
    db.insert(beamRevisions).values({
      id,
      beamId: values.beamId,
      version: values.version,
      model: values.model,
      authorId: values.authorId,
      changeSummary: values.changeSummary,
      createdAt: values.now,
    }),
    db.insert(revisionResults).values({ revisionId: id, result: values.result, createdAt: values.now }),
  ]);
}

/**
 * The whole save in one statement, so in one round trip and all-or-nothing: bump the beam's
 * version only if it is still `baseVersion`, and only then insert the revision, its result and the
 * audit event. False when someone saved since (nothing written). Concurrent saves on the same base
 * serialise on the beam's row lock; the loser's update then finds the version moved and matches
 * nothing.
 */
export async function saveRevisionAtomically(
  db: Db,
  values: { projectId: string; beamId: string; baseVersion: number; model: unknown; result: unknown; authorId: string; changeSummary: string; now: Date },
): Promise<boolean> {
  const version = values.baseVersion + 1;
  // parameters go as text with explicit casts: the driver sends them untyped
  const now = values.now.toISOString();
  const rows = await db.execute<{ saved: number }>(sql`
    WITH advanced AS (
      UPDATE beams SET latest_version = ${version}::int, updated_at = ${now}::timestamptz
      WHERE id = ${values.beamId}::uuid AND latest_version = ${values.baseVersion}::int
      RETURNING id
    ), revision AS (
      INSERT INTO beam_revisions (id, beam_id, version, model, author_id, change_summary, created_at)
      SELECT ${randomUUID()}::uuid, id, ${version}::int, ${JSON.stringify(values.model)}::jsonb, ${values.authorId}::uuid, ${values.changeSummary}::text, ${now}::timestamptz
      FROM advanced
      RETURNING id
    ), stored AS (
      INSERT INTO revision_results (revision_id, result, created_at)
      SELECT id, ${JSON.stringify(values.result)}::jsonb, ${now}::timestamptz FROM revision
    ), audited AS (
      INSERT INTO audit_events (project_id, actor_id, action, details)
      SELECT ${values.projectId}::uuid, ${values.authorId}::uuid, ${"revision.saved" satisfies AuditAction}::text, ${JSON.stringify({ beamId: values.beamId, version })}::jsonb
      FROM advanced
    )
    SELECT count(*)::int AS saved FROM advanced`);
  return rows[0]?.saved === 1;
}

/** Marks a draft checked; false when it was no longer a draft (checked revisions are immutable). */
export async function markChecked(
  db: Db,
  revisionId: string,
  values: { checkedById: string; checkedAt: Date; checkComment: string | null },
): Promise<boolean> {
  const rows = await db
    .update(beamRevisions)
    .set({ ...values, status: "checked" })
    .where(and(eq(beamRevisions.id, revisionId), eq(beamRevisions.status, "draft")))
    .returning({ id: beamRevisions.id });
  return rows.length > 0;
}
