import {
  apiRoutes,
  changeRoleRequestSchema,
  inviteMemberRequestSchema,
  type MemberListResponse,
  type MemberResponse,
} from "@spanwright/contracts";
import type { Router } from "express";
import { parseId } from "../access/access.js";
import { requireAuth } from "../auth/sessionCookie.js";
import { parseRequest } from "../http/validate.js";
import type { MembersService } from "./members.service.js";

export function registerMemberRoutes(router: Router, members: MembersService): void {
  router.get(apiRoutes.listMembers.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    res.json({ members: await members.list(user.id, projectId) } satisfies MemberListResponse);
  });

  router.post(apiRoutes.inviteMember.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const body = parseRequest(inviteMemberRequestSchema, req.body);
    res.status(201).json({ member: await members.invite(user.id, projectId, body) } satisfies MemberResponse);
  });

  router.patch(apiRoutes.changeMemberRole.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    const userId = parseId(req.params.userId, "member");
    const { role } = parseRequest(changeRoleRequestSchema, req.body);
    res.json({ member: await members.changeRole(user.id, projectId, userId, role) } satisfies MemberResponse);
  });

  router.delete(apiRoutes.removeMember.path, async (req, res) => {
    const { user } = requireAuth(res);
    const projectId = parseId(req.params.projectId, "project");
    await members.remove(user.id, projectId, parseId(req.params.userId, "member"));
    res.status(204).end();
  });
}
