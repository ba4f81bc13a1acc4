import { z } from "zod";

export const emailSchema = z.string().trim().toLowerCase().email().max(254);
/** NIST 800-63B style: length, not composition rules. */
export const passwordSchema = z.string().min(10, "at least 10 characters").max(256);
export const userIdSchema = z.string().uuid();

export const userSchema = z.object({
  id: userIdSchema,
  email: z.string(),
  name: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const signUpRequestSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(1).max(120),
  password: passwordSchema,
});
export type SignUpRequest = z.infer<typeof signUpRequestSchema>;

export const signInRequestSchema = z.object({
  email: emailSchema,
  password: z.string().min(1).max(256),
});
export type SignInRequest = z.infer<typeof signInRequestSchema>;

export const changePasswordRequestSchema = z.object({
  currentPassword: z.string().min(1).max(256),
  newPassword: passwordSchema,
});
export type ChangePasswordRequest = z.infer<typeof changePasswordRequestSchema>;

/** Answer of sign-up (201), sign-in (200) and `GET /api/me` (200). */
export const meResponseSchema = z.object({ user: userSchema });
export type MeResponse = z.infer<typeof meResponseSchema>;
