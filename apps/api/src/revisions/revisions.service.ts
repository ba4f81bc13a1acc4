import type { CheckRevisionRequest, Revision, RevisionSummary, SaveRevisionRequest } from "@spanwright/contracts";
import { authorize } from "../access/access.js";
import { recordAudit } from "../audit/audit.repo.js";
import type { BeamsService } from "../beams/beams.service.js";
import type { Clock } from "../clock.js";
import { inTransaction, type Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import { runSolver, type Engine } from "../solve/engine.js";
import { summariseRevisionChange } from "./changeSummary.js";
import { asBeamModel } from "./revisionContext.js";
import * as repo from "./revisions.repo.js";

/** A promise whose rejection is handled now and rethrown where it is awaited (outcomes taken in order). */
function quietly<T>(promise: Promise<T>): Promise<T> {
  promise.catch(() => undefined);
  return promise;
}

export function createRevisionsService(deps: { db: Db; clock: Clock; engine: Engine; beams: BeamsService }) {
  const { db, clock, engine, beams } = deps;

  async function requireRevision(tx: Db, beamId: string, version: number) {
    const revision = await repo.findRevision(tx, beamId, version);
    if (!revision) throw new AppError("not-found", "revision not found");
    return revision;
  }

  const toPublic = ({ id: _rowId, ...revision }: Revision & { id: string }): Revision => revision;

  return {
    async list(actorId: string, projectId: string, beamId: string): Promise<RevisionSummary[]> {
      await authorize(db, projectId, actorId, "read");
      await beams.requireBeam(db, projectId, beamId);
      return repo.listRevisions(db, beamId);
    },

    async get(actorId: string, projectId: string, beamId: string, version: number): Promise<Revision> {
      await authorize(db, projectId, actorId, "read");
      await beams.requireBeam(db, projectId, beamId);
      return toPublic(await requireRevision(db, beamId, version));
    },

    /**
     * Saves a new revision on top of `baseVersion`. Never overwrites: if someone saved since, 409
     * `version-conflict` with the current revision in details. The result is computed here and
     * stored with the revision in the same transaction.
     */
    async save(actorId: string, projectId: string, beamId: string, input: Required<SaveRevisionRequest>): Promise<Revision> {
      // The solve and the reads run at once, but their outcomes are taken in the order the rules
      // give them: access first (404/403), then the beam, then the model (422). Nothing is written
      // before all of them have succeeded.
      const solving = quietly(runSolver(engine, input.model));
      const access = quietly(authorize(db, projectId, actorId, "edit"));
      const found = quietly(repo.findSaveContext(db, { projectId, beamId, baseVersion: input.baseVersion, authorId: actorId }));
      await access;
      const context = await found;
      if (!context) throw new AppError("not-found", "beam not found");
      const result = await solving;
      const changeSummary = summariseRevisionChange(
        context.baseModel ? asBeamModel(context.baseModel) : null,
        asBeamModel(input.model),
        context.unitSystem,
        input.changeSummary,
      );
      const now = clock.now();
      const version = input.baseVersion + 1;
      const saved = await repo.saveRevisionAtomically(db, {
        projectId,
        beamId,
        baseVersion: input.baseVersion,
        model: input.model,
        result,
        authorId: actorId,
        changeSummary,
        now,
      });
      if (!saved) {
        const latest = await beams.requireBeam(db, projectId, beamId);
        const current = toPublic(await requireRevision(db, beamId, latest.latestVersion));
        throw new AppError(
          "version-conflict",
          `revision ${latest.latestVersion} was saved since you opened revision ${input.baseVersion}`,
          { baseVersion: input.baseVersion, current },
        );
      }
      // what was just written, as a read would give it: no second round trip for a large result
      return {
        version,
        author: { id: actorId, name: context.authorName ?? "" },
        createdAt: now.toISOString(),
        changeSummary,
        status: "draft",
        checkedBy: null,
        checkedAt: null,
        checkComment: null,
        model: input.model,
        result,
      };
    },

    /** Marks a draft checked (checkers only). A checked revision never changes again. */
    async check(actorId: string, projectId: string, beamId: string, version: number, input: CheckRevisionRequest): Promise<Revision> {
      await authorize(db, projectId, actorId, "check");
      await beams.requireBeam(db, projectId, beamId);
      const revision = await requireRevision(db, beamId, version);
      const changed = await inTransaction(db, async (tx) => {
        const ok = await repo.markChecked(tx, revision.id, {
          checkedById: actorId,
          checkedAt: clock.now(),
          checkComment: input.comment ?? null,
        });
        if (ok) await recordAudit(tx, { projectId, actorId, action: "revision.checked", details: { beamId, version } });
        return ok;
      });
      if (!changed) throw new AppError("already-checked", `revision ${version} is already ${revision.status}`);
      return toPublic(await requireRevision(db, beamId, version));
    },
  };
}

export type RevisionsService = ReturnType<typeof createRevisionsService>;
