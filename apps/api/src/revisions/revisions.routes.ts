import {
  apiRoutes,
  checkRevisionRequestSchema,
  saveRevisionRequestSchema,
  type RevisionListResponse,
  type RevisionResponse,
} from "@spanwright/contracts";
import type { Router } from "express";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import { AppError } from "../http/appError.js";
import { parseRequest } from "../http/validate.js";
import type { RevisionsService } from "./revisions.service.js";

export function parseVersion(value: unknown): number {
  const n = typeof value === "string" && /^[1-9]\d{0,8}$/.test(value) ? Number(value) : NaN;
  if (!Number.isInteger(n)) throw new AppError("not-found", "revision not found");
  return n;
}

export function registerRevisionRoutes(router: Router, revisions: RevisionsService): void {
  router.get(apiRoutes.listRevisions.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    res.json({ revisions: await revisions.list(user.id, projectId, beamId) } satisfies RevisionListResponse);
  });

  router.post(apiRoutes.saveRevision.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    const body = parseRequest(saveRevisionRequestSchema, req.body);
    const revision = await revisions.save(user.id, projectId, beamId, body);
    res.status(201).json({ revision } satisfies RevisionResponse);
  });

  router.get(apiRoutes.getRevision.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    const revision = await revisions.get(user.id, projectId, beamId, parseVersion(req.params.version));
    res.json({ revision } satisfies RevisionResponse);
  });

  router.post(apiRoutes.checkRevision.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const beamId = parseId(req.params.beamId, "beam");
    const body = parseRequest(checkRevisionRequestSchema, req.body);
    const revision = await revisions.check(user.id, projectId, beamId, parseVersion(req.params.version), body);
    res.json({ revision } satisfies RevisionResponse);
  });
}
