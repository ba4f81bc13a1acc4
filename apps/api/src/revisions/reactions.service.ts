import type { CompareResponse, ReactionTableResponse } from "@spanwright/contracts";
import {
  buildReactionTable,
  compareReactionTables,
  diffModels,
  summariseModelDiff,
  supportsWithUplift,
} from "@spanwright/handoff";
import type { Db } from "../db/client.js";
import { loadRevisionContext, projectUnits } from "./revisionContext.js";

/** Reaction tables and revision comparisons, computed from the stored results on each request. */
export function createReactionsService(deps: { db: Db }) {
  const { db } = deps;

  return {
    async table(actorId: string, ids: { projectId: string; beamId: string; version: number }): Promise<ReactionTableResponse> {
      const ctx = await loadRevisionContext(db, actorId, ids);
      const table = buildReactionTable(ctx.model, ctx.result);
      return {
        version: ctx.revision.version,
        units: projectUnits(ctx.project.unitSystem),
        table,
        upliftSupports: supportsWithUplift(table).map((s) => s.label),
      };
    },

    /**
     * Side-by-side reactions of two revisions of one beam, with absolute and percent change and
     * flags beyond the project's threshold, plus the model diff. The lower version is the "before"
     * side whichever order the caller gives; a revision compared with itself shows no change.
     */
    async compare(actorId: string, ids: { projectId: string; beamId: string }, query: { from: number; to: number }): Promise<CompareResponse> {
      const [olderVersion, newerVersion] = query.from < query.to ? [query.from, query.to] : [query.to, query.from];
      const older = await loadRevisionContext(db, actorId, { ...ids, version: olderVersion });
      const newer = await loadRevisionContext(db, actorId, { ...ids, version: newerVersion });
      const before = buildReactionTable(older.model, older.result);
      const after = buildReactionTable(newer.model, newer.result);
      const threshold = older.project.compareThresholdPercent;
      const comparison = compareReactionTables(before, after, threshold);
      const diff = diffModels(older.model, newer.model);
      return {
        from: olderVersion,
        to: newerVersion,
        thresholdPercent: threshold,
        units: projectUnits(older.project.unitSystem),
        before,
        after,
        supports: comparison.supports,
        values: comparison.values,
        flaggedCount: comparison.flagged.length,
        modelDiff: {
          changes: diff.changes as unknown as CompareResponse["modelDiff"]["changes"],
          summary: summariseModelDiff(diff, older.project.unitSystem),
        },
      };
    },
  };
}

export type ReactionsService = ReturnType<typeof createReactionsService>;
