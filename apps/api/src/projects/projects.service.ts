import type { CreateProjectRequest, Project, UpdateProjectRequest } from "@spanwright/contracts";
import { authorize } from "../access/access.js";
import { recordAudit } from "../audit/audit.repo.js";
import type { Clock } from "../clock.js";
import { inTransaction, type Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import * as repo from "./projects.repo.js";

export function createProjectsService(deps: { db: Db; clock: Clock }) {
  const { db, clock } = deps;

  async function get(userId: string, projectId: string): Promise<Project> {
    const project = await repo.findProjectForMember(db, projectId, userId);
    if (!project) throw new AppError("not-found", "project not found");
    return project;
  }

  return {
    list: (userId: string) => repo.listProjectsForUser(db, userId),

    get,

    create: (userId: string, input: Required<CreateProjectRequest>) =>
      inTransaction(db, async (tx) => {
        const project = await repo.insertProject(tx, input, userId);
        await recordAudit(tx, { projectId: project.id, actorId: userId, action: "project.created", details: { name: input.name } });
        return project;
      }),

    async update(userId: string, projectId: string, patch: UpdateProjectRequest): Promise<Project> {
      await authorize(db, projectId, userId, "manage");
      await inTransaction(db, async (tx) => {
        await repo.updateProject(tx, projectId, patch, clock.now());
        await recordAudit(tx, { projectId, actorId: userId, action: "project.updated", details: { ...patch } });
      });
      return get(userId, projectId);
    },

    async remove(userId: string, projectId: string): Promise<void> {
      await authorize(db, projectId, userId, "manage");
      await inTransaction(db, async (tx) => {
        await recordAudit(tx, { projectId, actorId: userId, action: "project.deleted" });
        await repo.deleteProject(tx, projectId);
      });
    },
  };
}

export type ProjectsService = ReturnType<typeof createProjectsService>;
