import { apiRoutes, compareQuerySchema, type CompareResponse, type ReactionTableResponse } from "@spanwright/contracts";
import type { Router } from "express";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import { parseRequest } from "../http/validate.js";
import type { ReactionsService } from "./reactions.service.js";
import { parseVersion } from "./revisions.routes.js";

/** Register before the revision routes: `…/revisions/compare` must not reach `…/revisions/:version`. */
export function registerReactionRoutes(router: Router, reactions: ReactionsService): void {
  router.get(apiRoutes.compareRevisions.path, async (req, res) => {
    const { user } = requireAuth(res);
    const ids = { projectId: parseId(req.params.projectId, "project"), beamId: parseId(req.params.beamId, "beam") };
    const query = parseRequest(compareQuerySchema, req.query, "query");
    res.json((await reactions.compare(user.id, ids, query)) satisfies CompareResponse);
  });

  router.get(apiRoutes.getReactions.path, async (req, res) => {
    const { user } = requireAuth(res);
    const ids = {
      projectId: parseId(req.params.projectId, "project"),
      beamId: parseId(req.params.beamId, "beam"),
      version: parseVersion(req.params.version),
    };
    res.json((await reactions.table(user.id, ids)) satisfies ReactionTableResponse);
  });
}
