import { z } from "zod";
import { userIdSchema } from "./auth.js";
import { roleSchema } from "./roles.js";

export const projectIdSchema = z.string().uuid();
export const unitSystemSchema = z.enum(["si", "us"]);
export type UnitSystem = z.infer<typeof unitSystemSchema>;

const projectNameSchema = z.string().trim().min(1).max(120);
/** Reaction change (percent) above which a revision comparison flags a reaction. */
const compareThresholdSchema = z.number().min(0).max(100);

export const projectSchema = z.object({
  id: projectIdSchema,
  name: projectNameSchema,
  unitSystem: unitSystemSchema,
  compareThresholdPercent: z.number(),
  /** The signed-in user's role in this project. */
  role: roleSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Project = z.infer<typeof projectSchema>;

export const createProjectRequestSchema = z.object({
  name: projectNameSchema,
  unitSystem: unitSystemSchema.default("si"),
  compareThresholdPercent: compareThresholdSchema.default(5),
});
export type CreateProjectRequest = z.input<typeof createProjectRequestSchema>;

/** Rename and/or change settings; at least one field. */
export const updateProjectRequestSchema = z
  .object({
    name: projectNameSchema.optional(),
    unitSystem: unitSystemSchema.optional(),
    compareThresholdPercent: compareThresholdSchema.optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), "give at least one field to change");
export type UpdateProjectRequest = z.infer<typeof updateProjectRequestSchema>;

export const projectResponseSchema = z.object({ project: projectSchema });
export type ProjectResponse = z.infer<typeof projectResponseSchema>;
export const projectListResponseSchema = z.object({ projects: z.array(projectSchema) });
export type ProjectListResponse = z.infer<typeof projectListResponseSchema>;

export const memberSchema = z.object({
  userId: userIdSchema,
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  /** true until the invited e-mail signs up and proves the address (follows the mailed link). */
  pending: z.boolean(),
  addedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const inviteMemberRequestSchema = z.object({
  email: z.string().trim().toLowerCase().email().max(254),
  role: roleSchema,
});
export type InviteMemberRequest = z.infer<typeof inviteMemberRequestSchema>;
export const changeRoleRequestSchema = z.object({ role: roleSchema });
export type ChangeRoleRequest = z.infer<typeof changeRoleRequestSchema>;

export const memberResponseSchema = z.object({ member: memberSchema });
export type MemberResponse = z.infer<typeof memberResponseSchema>;
export const memberListResponseSchema = z.object({ members: z.array(memberSchema) });
export type MemberListResponse = z.infer<typeof memberListResponseSchema>;
