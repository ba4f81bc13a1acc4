import { can, type Permission, type Role } from "@spanwright/contracts";
import type { Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import { findRole } from "./access.repo.js";

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A path id that is not a UUID names nothing: 404, like any unknown id. */
export function parseId(value: unknown, what: string): string {
  if (typeof value !== "string" || !uuidPattern.test(value)) throw new AppError("not-found", `${what} not found`);
  return value.toLowerCase();
}

/**
 * The caller's role in the project, if it grants `permission`. Non-members get 404 so a project's
 * existence is never revealed; members whose role lacks the permission get 403.
 */
export async function authorize(db: Db, projectId: string, userId: string, permission: Permission): Promise<Role> {
  const role = await findRole(db, projectId, userId);
  if (!role) throw new AppError("not-found", "project not found");
  if (!can(role, permission)) {
    throw new AppError("forbidden", `your role (${role}) does not allow this`, { role, needs: permission });
  }
  return role;
}
