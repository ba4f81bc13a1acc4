import { eq } from "drizzle-orm";
import type { Beam, Permission, ProjectUnits, Revision, UnitSystem } from "@spanwright/contracts";
import { displayUnit, type BeamModel, type SolveResult } from "@spanwright/handoff";
import { validateModel } from "@spanwright/solver";
import { authorize } from "../access/access.js";
import { findBeam } from "../beams/beams.repo.js";
import type { Db } from "../db/client.js";
import { projects } from "../db/schema.js";
import { AppError } from "../http/appError.js";
import { findRevision } from "./revisions.repo.js";

/** What the reaction table, exports, compare and hand-offs need about a project. */
export interface ProjectInfo {
  id: string;
  name: string;
  unitSystem: UnitSystem;
  compareThresholdPercent: number;
}

export interface RevisionContext {
  project: ProjectInfo;
  beam: Beam;
  revision: Revision & { id: string };
  /**
   * The stored model and result, typed. Both were produced by the solver on save (model validated,
   * result computed on the server), so the casts only name what is already known.
   */
  model: BeamModel;
  result: SolveResult;
}

export async function findProjectInfo(db: Db, projectId: string): Promise<ProjectInfo | null> {
  const [row] = await db
    .select({ id: projects.id, name: projects.name, unitSystem: projects.unitSystem, compareThresholdPercent: projects.compareThresholdPercent })
    .from(projects)
    .where(eq(projects.id, projectId));
  return row ?? null;
}

export function projectUnits(system: UnitSystem): ProjectUnits {
  return {
    system,
    force: displayUnit(system, "force"),
    moment: displayUnit(system, "moment"),
    length: displayUnit(system, "length"),
  };
}

/**
 * A stored model with the exchange format's defaults filled in (no combinations, no stations, …),
 * as the solver read it: stored models are the JSON as saved, where optional parts may be absent.
 */
export function asBeamModel(json: Record<string, unknown>): BeamModel {
  const parsed = validateModel(json);
  // every stored model passed the solver on save; a failure here is a corrupted row
  if (!parsed.ok) throw new Error(`stored model is not valid: ${parsed.error.where} ${parsed.error.message}`);
  return parsed.value;
}
export const asSolveResult = (json: Record<string, unknown>): SolveResult => json as unknown as SolveResult;

/** Authorises the caller, then loads project, beam and revision; anything missing is 404. */
export async function loadRevisionContext(
  db: Db,
  actorId: string,
  ids: { projectId: string; beamId: string; version: number },
  permission: Permission = "read",
): Promise<RevisionContext> {
  await authorize(db, ids.projectId, actorId, permission);
  const project = await findProjectInfo(db, ids.projectId);
  const beam = await findBeam(db, ids.projectId, ids.beamId);
  if (!project || !beam) throw new AppError("not-found", "beam not found");
  const revision = await findRevision(db, ids.beamId, ids.version);
  if (!revision) throw new AppError("not-found", "revision not found");
  return { project, beam, revision, model: asBeamModel(revision.model), result: asSolveResult(revision.result) };
}
