import {
  apiRoutes,
  createProjectRequestSchema,
  updateProjectRequestSchema,
  type ProjectListResponse,
  type ProjectResponse,
} from "@spanwright/contracts";
import type { Router } from "express";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import { parseRequest } from "../http/validate.js";
import type { ProjectsService } from "./projects.service.js";

export function registerProjectRoutes(router: Router, projects: ProjectsService): void {
  router.get(apiRoutes.listProjects.path, async (_req, res) => {
    const { user } = requireAuth(res);
    res.json({ projects: await projects.list(user.id) } satisfies ProjectListResponse);
  });

  router.post(apiRoutes.createProject.path, async (req, res) => {
    const { user } = requireAuth(res);
    const body = parseRequest(createProjectRequestSchema, req.body);
    res.status(201).json({ project: await projects.create(user.id, body) } satisfies ProjectResponse);
  });

  router.get(apiRoutes.getProject.path, async (req, res) => {
    const { user } = requireAuth(res);
    const project = await projects.get(user.id, parseId(req.params.projectId, "project"));
    res.json({ project } satisfies ProjectResponse);
  });

  router.patch(apiRoutes.updateProject.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const body = parseRequest(updateProjectRequestSchema, req.body);
    res.json({ project: await projects.update(user.id, projectId, body) } satisfies ProjectResponse);
  });

  router.delete(apiRoutes.deleteProject.path, async (req, res) => {
    const { user } = requireAuth(res);
    await projects.remove(user.id, parseId(req.params.projectId, "project"));
    res.status(204).end();
  });
}
