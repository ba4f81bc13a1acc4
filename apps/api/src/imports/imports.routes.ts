import { apiRoutes, baseVersionSchema, type BeamResponse, type LoadSchedulePreviewResponse, type RevisionResponse } from "@spanwright/contracts";
import type { RequestHandler, Router } from "express";
import { z } from "zod";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import { parseRequest } from "../http/validate.js";
import type { ImportsService } from "./imports.service.js";
import { readUpload, uploadOne } from "./upload.js";

// multipart text fields arrive as strings
const importFieldsSchema = z.object({ name: z.string().trim().max(120).optional() });
const applyFieldsSchema = z.object({ baseVersion: z.coerce.number().pipe(baseVersionSchema) });

export function registerImportRoutes(router: Router, imports: ImportsService): void {
  /** Authorise before multer reads the body: callers without the right never upload anything. */
  const canEdit: RequestHandler = async (req, res, next) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = req.params.beamId === undefined ? undefined : parseId(req.params.beamId, "beam");
    await imports.authorizeEdit(user.id, projectId, beamId);
    next();
  };

  router.post(apiRoutes.importBeam.path, canEdit, ...uploadOne("json"), async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const fields = parseRequest(importFieldsSchema, req.body);
    const created = await imports.importBeam(user.id, projectId, readUpload(req.file), fields.name || undefined);
    res.status(201).json(created satisfies BeamResponse);
  });

  router.post(apiRoutes.previewLoadSchedule.path, canEdit, ...uploadOne("csv"), async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    res.json((await imports.previewSchedule(user.id, projectId, beamId, readUpload(req.file))) satisfies LoadSchedulePreviewResponse);
  });

  router.post(apiRoutes.applyLoadSchedule.path, canEdit, ...uploadOne("csv"), async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    const fields = parseRequest(applyFieldsSchema, req.body);
    const revision = await imports.applySchedule(user.id, projectId, beamId, fields.baseVersion, readUpload(req.file));
    res.status(201).json({ revision } satisfies RevisionResponse);
  });
}
