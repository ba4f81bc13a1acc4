import { z } from "zod";

/** A member's role in one project. Order matters only for display; permissions live in `can`. */
export const roles = ["owner", "engineer", "checker", "viewer"] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** What a role may do in a project. The API enforces these; the web app uses them to hide controls. */
export type Permission =
  | "read" // project, members, beams, revisions
  | "edit" // create/rename/delete beams, save revisions
  | "check" // mark a revision checked
  | "manage"; // members, rename/settings, delete the project

const permissionsByRole: Record<Role, readonly Permission[]> = {
  owner: ["read", "edit", "manage"],
  engineer: ["read", "edit"],
  checker: ["read", "check"],
  viewer: ["read"],
};

export function can(role: Role, permission: Permission): boolean {
  return permissionsByRole[role].includes(permission);
}
