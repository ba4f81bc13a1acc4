import { z } from "zod";

export const emailSchema = z.string().trim().toLowerCase().email().max(254);
/** NIST 800-63B style: length, not composition rules. */
export const passwordSchema = z.string().min(10, "at least 10 characters").max(256);
export const userIdSchema = z.string().uuid();

export const userSchema = z.object({
  id: userIdSchema,
  email: z.string(),
  name: z.string(),
  /**
   * False only for an account that took over an invitation's placeholder and has not yet followed
   * the link mailed to its address: until then the projects it was invited to stay closed (404).
   * The API always sends it; optional so a user object without it still parses.
   */
  emailVerified: z.boolean().optional(),
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

/** `POST /api/auth/verify-email`: the token from the link in the verification e-mail. */
export const verifyEmailRequestSchema = z.object({
  token: z.string().min(1).max(200),
});
export type VerifyEmailRequest = z.infer<typeof verifyEmailRequestSchema>;

/** Answer of `POST /api/auth/verify-email` (200): the e-mail that is now verified. */
export const verifyEmailResponseSchema = z.object({ email: z.string() });
export type VerifyEmailResponse = z.infer<typeof verifyEmailResponseSchema>;

/** Answer of sign-up (201), sign-in (200) and `GET /api/me` (200). */
export const meResponseSchema = z.object({ user: userSchema });
export type MeResponse = z.infer<typeof meResponseSchema>;
