import {
  apiRoutes,
  createBeamRequestSchema,
  renameBeamRequestSchema,
  updateBeamDesignRequestSchema,
  type BeamDesignResponse,
  type BeamListResponse,
  type BeamResponse,
} from "@spanwright/contracts";
import type { Router } from "express";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import { parseRequest } from "../http/validate.js";
import type { BeamsService } from "./beams.service.js";

export function registerBeamRoutes(router: Router, beams: BeamsService): void {
  router.get(apiRoutes.listBeams.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    res.json({ beams: await beams.list(user.id, projectId) } satisfies BeamListResponse);
  });

  router.post(apiRoutes.createBeam.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const body = parseRequest(createBeamRequestSchema, req.body);
    res.status(201).json((await beams.create(user.id, projectId, body)) satisfies BeamResponse);
  });

  router.get(apiRoutes.getBeam.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    res.json((await beams.get(user.id, projectId, parseId(req.params.beamId, "beam"))) satisfies BeamResponse);
  });

  router.patch(apiRoutes.renameBeam.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    const { name } = parseRequest(renameBeamRequestSchema, req.body);
    res.json((await beams.rename(user.id, projectId, beamId, name)) satisfies BeamResponse);
  });

  router.patch(apiRoutes.updateBeamDesign.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    const body = parseRequest(updateBeamDesignRequestSchema, req.body);
    res.json((await beams.updateDesign(user.id, projectId, beamId, body)) satisfies BeamDesignResponse);
  });

  router.delete(apiRoutes.deleteBeam.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    await beams.remove(user.id, projectId, parseId(req.params.beamId, "beam"));
    res.status(204).end();
  });
}
