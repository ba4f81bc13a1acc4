import type { Beam, BeamDesignResponse, BeamResponse, CreateBeamRequest, UpdateBeamDesignRequest } from "@spanwright/contracts";
import { authorize } from "../access/access.js";
import { recordAudit } from "../audit/audit.repo.js";
import type { Clock } from "../clock.js";
import { inTransaction, type Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import { findRevision, insertRevisionWithResult } from "../revisions/revisions.repo.js";
import { runSolver, type Engine } from "../solve/engine.js";
import * as repo from "./beams.repo.js";
import { checkDesignSettings, readDesignSettings } from "./designSettings.js";

export function createBeamsService(deps: { db: Db; clock: Clock; engine: Engine }) {
  const { db, clock, engine } = deps;

  async function requireBeam(tx: Db, projectId: string, beamId: string): Promise<Beam> {
    const beam = await repo.findBeam(tx, projectId, beamId);
    if (!beam) throw new AppError("not-found", "beam not found");
    return beam;
  }

  async function withLatest(tx: Db, beam: Beam): Promise<BeamResponse> {
    const revision = await findRevision(tx, beam.id, beam.latestVersion);
    if (!revision) throw new Error(`beam ${beam.id} has no revision ${beam.latestVersion}`);
    const { id: _rowId, ...publicRevision } = revision;
    return { beam, revision: publicRevision, designSettings: readDesignSettings(await repo.findDesignSettings(tx, beam.id)) };
  }

  return {
    requireBeam,

    async list(actorId: string, projectId: string): Promise<Beam[]> {
      await authorize(db, projectId, actorId, "read");
      return repo.listBeams(db, projectId);
    },

    /** Creates the beam and its revision 1, solved on the server, in one transaction. */
    async create(actorId: string, projectId: string, input: Required<CreateBeamRequest>): Promise<BeamResponse> {
      await authorize(db, projectId, actorId, "edit");
      const result = await runSolver(engine, input.model);
      const now = clock.now();
      return inTransaction(db, async (tx) => {
        const beam = await repo.insertBeam(tx, { projectId, name: input.name, now });
        await insertRevisionWithResult(tx, {
          beamId: beam.id,
          version: 1,
          model: input.model,
          result,
          authorId: actorId,
          changeSummary: input.changeSummary,
          now,
        });
        await recordAudit(tx, { projectId, actorId, action: "beam.created", details: { beamId: beam.id, name: input.name } });
        return withLatest(tx, beam);
      });
    },

    async get(actorId: string, projectId: string, beamId: string): Promise<BeamResponse> {
      await authorize(db, projectId, actorId, "read");
      return withLatest(db, await requireBeam(db, projectId, beamId));
    },

    async rename(actorId: string, projectId: string, beamId: string, name: string): Promise<BeamResponse> {
      await authorize(db, projectId, actorId, "edit");
      await requireBeam(db, projectId, beamId);
      await inTransaction(db, async (tx) => {
        await repo.renameBeam(tx, beamId, name, clock.now());
        await recordAudit(tx, { projectId, actorId, action: "beam.renamed", details: { beamId, name } });
      });
      return withLatest(db, await requireBeam(db, projectId, beamId));
    },

    /** Replaces the saved design settings whole; nothing is written when they are refused. */
    async updateDesign(actorId: string, projectId: string, beamId: string, input: UpdateBeamDesignRequest): Promise<BeamDesignResponse> {
      await authorize(db, projectId, actorId, "edit");
      await requireBeam(db, projectId, beamId);
      const settings = input.designSettings === null ? null : await checkDesignSettings(db, projectId, input.designSettings);
      await inTransaction(db, async (tx) => {
        await repo.setDesignSettings(tx, beamId, settings, clock.now());
        await recordAudit(tx, { projectId, actorId, action: "beam.design-settings-saved", details: { beamId, cleared: settings === null } });
      });
      return { designSettings: readDesignSettings(await repo.findDesignSettings(db, beamId)) };
    },

    async remove(actorId: string, projectId: string, beamId: string): Promise<void> {
      await authorize(db, projectId, actorId, "edit");
      const beam = await requireBeam(db, projectId, beamId);
      await inTransaction(db, async (tx) => {
        await repo.deleteBeam(tx, beamId);
        await recordAudit(tx, { projectId, actorId, action: "beam.deleted", details: { beamId, name: beam.name } });
      });
    },
  };
}

export type BeamsService = ReturnType<typeof createBeamsService>;
