import type { Request, RequestHandler, Response } from "express";
import type { User } from "@spanwright/contracts";
import { AppError } from "../http/appError.js";
import type { AuthService } from "./auth.service.js";

export interface RequestAuth {
  user: User;
  sessionId: string;
}

function cookieOptions(req: Request, expires: Date) {
  // Secure only over https (req.secure honours TRUST_PROXY), so plain-http development still works
  return { httpOnly: true, sameSite: "lax" as const, secure: req.secure, path: "/", expires };
}

export function setSessionCookie(req: Request, res: Response, name: string, token: string, expires: Date): void {
  res.cookie(name, token, cookieOptions(req, expires));
}

export function clearSessionCookie(req: Request, res: Response, name: string): void {
  res.clearCookie(name, { httpOnly: true, sameSite: "lax", secure: req.secure, path: "/" });
}

export function readSessionToken(req: Request, name: string): string | null {
  const value: unknown = req.cookies?.[name];
  return typeof value === "string" && value.length > 0 && value.length < 200 ? value : null;
}

/** Resolves the session cookie into `res.locals.auth` (or null), renewing the cookie when it slid. */
export function loadSession(auth: AuthService, cookieName: string): RequestHandler {
  return async (req, res, next) => {
    res.locals.auth = null;
    const token = readSessionToken(req, cookieName);
    if (!token) return next();
    const found = await auth.authenticate(token);
    if (!found) {
      clearSessionCookie(req, res, cookieName);
      return next();
    }
    if (found.renewedUntil) setSessionCookie(req, res, cookieName, token, found.renewedUntil);
    const value: RequestAuth = { user: found.user, sessionId: found.sessionId };
    res.locals.auth = value;
    next();
  };
}

/** The signed-in caller, or 401. */
export function requireAuth(res: Response): RequestAuth {
  const value = res.locals.auth as RequestAuth | null | undefined;
  if (!value) throw new AppError("unauthenticated", "sign in first");
  return value;
}
