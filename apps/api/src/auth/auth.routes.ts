import {
  apiRoutes,
  changePasswordRequestSchema,
  signInRequestSchema,
  signUpRequestSchema,
  verifyEmailRequestSchema,
  type MeResponse,
  type VerifyEmailResponse,
} from "@spanwright/contracts";
import type { RequestHandler, Router } from "express";
import { parseRequest } from "../http/validate.js";
import type { AuthService } from "./auth.service.js";
import type { EmailVerificationService } from "./emailVerification.js";
import { clearSessionCookie, readSessionToken, requireAuth, setSessionCookie } from "./sessionCookie.js";

export function registerAuthRoutes(
  router: Router,
  deps: { auth: AuthService; emailVerification: EmailVerificationService; cookieName: string; authRateLimit: RequestHandler },
): void {
  const { auth, emailVerification, cookieName, authRateLimit } = deps;

  router.post(apiRoutes.signUp.path, authRateLimit, async (req, res) => {
    const body = parseRequest(signUpRequestSchema, req.body);
    const { user, session } = await auth.signUp(body);
    setSessionCookie(req, res, cookieName, session.token, session.expiresAt);
    res.status(201).json({ user } satisfies MeResponse);
  });

  router.post(apiRoutes.signIn.path, authRateLimit, async (req, res) => {
    const body = parseRequest(signInRequestSchema, req.body);
    const { user, session } = await auth.signIn(body, readSessionToken(req, cookieName));
    setSessionCookie(req, res, cookieName, session.token, session.expiresAt);
    res.json({ user } satisfies MeResponse);
  });

  router.post(apiRoutes.signOut.path, async (req, res) => {
    const token = readSessionToken(req, cookieName);
    if (token) await auth.signOut(token);
    clearSessionCookie(req, res, cookieName);
    res.status(204).end();
  });

  // public: the token is the proof, so the link also works in a browser that is not signed in
  router.post(apiRoutes.verifyEmail.path, authRateLimit, async (req, res) => {
    const { token } = parseRequest(verifyEmailRequestSchema, req.body);
    res.json((await auth.verifyEmail(token)) satisfies VerifyEmailResponse);
  });

  router.post(apiRoutes.resendVerification.path, authRateLimit, async (_req, res) => {
    const { user } = requireAuth(res);
    await emailVerification.resend(user);
    res.status(204).end();
  });

  router.get(apiRoutes.me.path, (_req, res) => {
    const { user } = requireAuth(res);
    res.json({ user } satisfies MeResponse);
  });

  router.post(apiRoutes.changePassword.path, async (req, res) => {
    const { user, sessionId } = requireAuth(res);
    const body = parseRequest(changePasswordRequestSchema, req.body);
    await auth.changePassword(user.id, sessionId, body);
    res.status(204).end();
  });
}
