import type { InviteMemberRequest, Member, Role } from "@spanwright/contracts";
import { authorize } from "../access/access.js";
import { recordAudit } from "../audit/audit.repo.js";
import { findUserByEmail, insertUser } from "../auth/auth.repo.js";
import { inTransaction, type Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import * as repo from "./members.repo.js";

/** A placeholder's display name until its owner signs up: the part of the e-mail before the @. */
const placeholderName = (email: string) => email.split("@")[0] || email;

export function createMembersService(deps: { db: Db }) {
  const { db } = deps;

  async function requireMember(tx: Db, projectId: string, userId: string): Promise<Member> {
    const member = await repo.findMember(tx, projectId, userId);
    if (!member) throw new AppError("not-found", "member not found");
    return member;
  }

  /** Refuses to leave the project without an owner (409 `last-owner`). */
  async function guardLastOwner(tx: Db, projectId: string, member: Member, nextRole: Role | null): Promise<void> {
    if (member.role !== "owner" || nextRole === "owner") return;
    const owners = await repo.lockOwners(tx, projectId);
    if (owners.length <= 1) {
      throw new AppError("last-owner", "a project needs at least one owner; make someone else owner first");
    }
  }

  return {
    async list(actorId: string, projectId: string): Promise<Member[]> {
      await authorize(db, projectId, actorId, "read");
      return repo.listMembers(db, projectId);
    },

    /**
     * Adds a user by e-mail. An e-mail without an account gets a placeholder account (no password)
     * that the invitee completes by signing up with that e-mail; until then the member is `pending`.
     */
    async invite(actorId: string, projectId: string, input: InviteMemberRequest): Promise<Member> {
      await authorize(db, projectId, actorId, "manage");
      return inTransaction(db, async (tx) => {
        const user =
          (await findUserByEmail(tx, input.email)) ??
          (await insertUser(tx, { email: input.email, name: placeholderName(input.email), passwordHash: null }));
        if (!(await repo.insertMember(tx, projectId, user.id, input.role))) {
          throw new AppError("already-member", `${input.email} is already a member of this project`);
        }
        await recordAudit(tx, {
          projectId,
          actorId,
          action: "member.invited",
          details: { userId: user.id, role: input.role, placeholder: user.passwordHash === null },
        });
        return requireMember(tx, projectId, user.id);
      });
    },

    async changeRole(actorId: string, projectId: string, userId: string, role: Role): Promise<Member> {
      await authorize(db, projectId, actorId, "manage");
      return inTransaction(db, async (tx) => {
        const member = await requireMember(tx, projectId, userId);
        await guardLastOwner(tx, projectId, member, role);
        await repo.updateRole(tx, projectId, userId, role);
        await recordAudit(tx, { projectId, actorId, action: "member.role-changed", details: { userId, from: member.role, to: role } });
        return requireMember(tx, projectId, userId);
      });
    },

    async remove(actorId: string, projectId: string, userId: string): Promise<void> {
      await authorize(db, projectId, actorId, "manage");
      await inTransaction(db, async (tx) => {
        const member = await requireMember(tx, projectId, userId);
        await guardLastOwner(tx, projectId, member, null);
        await repo.deleteMember(tx, projectId, userId);
        await recordAudit(tx, { projectId, actorId, action: "member.removed", details: { userId, role: member.role } });
      });
    },
  };
}

export type MembersService = ReturnType<typeof createMembersService>;
