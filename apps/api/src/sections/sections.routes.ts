import {
  apiRoutes,
  createSectionRequestSchema,
  updateSectionRequestSchema,
  type SectionListResponse,
  type SectionResponse,
} from "@spanwright/contracts";
import type { Router } from "express";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import { parseRequest } from "../http/validate.js";
import type { SectionsService } from "./sections.service.js";

export function registerSectionRoutes(router: Router, sections: SectionsService): void {
  router.get(apiRoutes.listSections.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    res.json({ sections: await sections.list(user.id, projectId) } satisfies SectionListResponse);
  });

  router.post(apiRoutes.createSection.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const body = parseRequest(createSectionRequestSchema, req.body);
    res.status(201).json({ section: await sections.create(user.id, projectId, body) } satisfies SectionResponse);
  });

  router.patch(apiRoutes.updateSection.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const sectionId = parseId(req.params.sectionId, "section");
    const body = parseRequest(updateSectionRequestSchema, req.body);
    res.json({ section: await sections.update(user.id, projectId, sectionId, body) } satisfies SectionResponse);
  });

  router.delete(apiRoutes.deleteSection.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    await sections.remove(user.id, projectId, parseId(req.params.sectionId, "section"));
    res.status(204).end();
  });
}
