import { encodeBase32LowerCaseNoPadding } from "@oslojs/encoding";
import { createHash, randomBytes } from "node:crypto";

const day = 24 * 60 * 60 * 1000;
/** A session lives 30 days from its last renewal. */
export const sessionLifetimeMs = 30 * day;
/** Renew (slide the expiry) once less than half the lifetime is left, so active users stay signed in. */
export const sessionRenewWithinMs = 15 * day;

/** 160 random bits, base32: the value of the cookie. Never stored. */
export function generateSessionToken(): string {
  return encodeBase32LowerCaseNoPadding(randomBytes(20));
}

/**
 * The session id stored in the database: hex SHA-256 of the token, so a leaked table grants nothing.
 * Node's native hash: this runs on every request, where a hash written in JavaScript cost ~15 µs.
 */
export function sessionIdFromToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export type SessionState = "valid" | "renew" | "expired";

export function sessionState(expiresAt: Date, now: Date): SessionState {
  const left = expiresAt.getTime() - now.getTime();
  if (left <= 0) return "expired";
  return left < sessionRenewWithinMs ? "renew" : "valid";
}

export function sessionExpiry(now: Date): Date {
  return new Date(now.getTime() + sessionLifetimeMs);
}
