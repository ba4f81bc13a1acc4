import {
  apiRoutes,
  createHandoffRequestSchema,
  type HandoffListResponse,
  type HandoffResponse,
} from "@spanwright/contracts";
import type { Router } from "express";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import { parseRequest } from "../http/validate.js";
import { parseVersion } from "../revisions/revisions.routes.js";
import type { HandoffsService } from "./handoffs.service.js";

export function registerHandoffRoutes(router: Router, handoffs: HandoffsService): void {
  router.post(apiRoutes.createHandoff.path, async (req, res) => {
    const { user } = requireAuth(res);
    const ids = {
      projectId: parseId(req.params.projectId, "project"),
      beamId: parseId(req.params.beamId, "beam"),
      version: parseVersion(req.params.version),
    };
    const body = parseRequest(createHandoffRequestSchema, req.body);
    const handoff = await handoffs.create(user.id, ids, body);
    res.status(201).json({ handoff } satisfies HandoffResponse);
  });

  router.get(apiRoutes.listProjectHandoffs.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    res.json({ handoffs: await handoffs.list(user.id, projectId) } satisfies HandoffListResponse);
  });

  router.get(apiRoutes.listBeamHandoffs.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    res.json({ handoffs: await handoffs.list(user.id, projectId, beamId) } satisfies HandoffListResponse);
  });
}
