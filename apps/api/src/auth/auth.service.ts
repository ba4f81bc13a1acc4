import type { ChangePasswordRequest, SignInRequest, SignUpRequest, User } from "@spanwright/contracts";
import type { Clock } from "../clock.js";
import { inTransaction, type Db } from "../db/client.js";
import { recordAudit } from "../audit/audit.repo.js";
import { AppError } from "../http/appError.js";
import { isUniqueViolation } from "../http/dbErrors.js";
import * as repo from "./auth.repo.js";
import { createSessionCache } from "./sessionCache.js";
import { burnPasswordCheck, hashPassword, verifyPassword } from "./password.js";
import type { EmailVerificationService } from "./emailVerification.js";
import { generateSessionToken, sessionExpiry, sessionIdFromToken, sessionState } from "./sessionToken.js";

export interface IssuedSession {
  /** The cookie value; only its hash is stored. */
  token: string;
  sessionId: string;
  expiresAt: Date;
}

export interface Authenticated {
  user: User;
  sessionId: string;
  /** Set when the expiry slid forward and the cookie must be sent again. */
  renewedUntil: Date | null;
}

/** How long a session lookup is reused in this process (sessionCache.ts). */
export const SESSION_CACHE_TTL_MS = 5000;

const toUser = (u: repo.UserRecord): User => ({ id: u.id, email: u.email, name: u.name, emailVerified: u.emailVerifiedAt !== null });

export function createAuthService(deps: { db: Db; clock: Clock; emailVerification: EmailVerificationService }) {
  const { db, clock, emailVerification } = deps;
  const sessions = createSessionCache({ ttlMs: SESSION_CACHE_TTL_MS, maxEntries: 10_000 });

  async function issueSession(userId: string, tx: Db = db): Promise<IssuedSession> {
    const token = generateSessionToken();
    const sessionId = sessionIdFromToken(token);
    const expiresAt = sessionExpiry(clock.now());
    await repo.insertSession(tx, { id: sessionId, userId, expiresAt });
    return { token, sessionId, expiresAt };
  }

  /** The new account, or the placeholder of this e-mail completed; 409 `email-taken` otherwise. */
  async function createOrClaim(input: SignUpRequest, passwordHash: string): Promise<{ user: User; session: IssuedSession }> {
    try {
      return await inTransaction(db, async (tx) => {
        const existing = await repo.findUserByEmail(tx, input.email);
        let user: repo.UserRecord | null;
        if (existing) {
          user = existing.passwordHash === null
            ? await repo.claimPlaceholderUser(tx, existing.id, { name: input.name, passwordHash })
            : null;
          if (!user) throw new AppError("email-taken", "an account with this e-mail already exists");
        } else {
          user = await repo.insertUser(tx, { email: input.email, name: input.name, passwordHash, emailVerifiedAt: clock.now() });
        }
        await recordAudit(tx, { projectId: null, actorId: user.id, action: "user.signed-up" });
        return { user: toUser(user), session: await issueSession(user.id, tx) };
      });
    } catch (error) {
      if (isUniqueViolation(error, "users_email_key")) {
        throw new AppError("email-taken", "an account with this e-mail already exists");
      }
      throw error;
    }
  }

  return {
    issueSession,

    /**
     * Deletes the sessions that expired: an expired session is refused and deleted when it is
     * presented, but one that never comes back would otherwise stay forever. The server runs this at
     * start and every hour.
     */
    sweepExpiredSessions(): Promise<number> {
      return repo.deleteExpiredSessions(db, clock.now());
    },

    /**
     * Creates the account, or completes a placeholder an invitation created for this e-mail. A new
     * address is verified at once (it opens nothing); a completed placeholder is signed in but its
     * invitations stay closed until the link mailed to the address is followed.
     */
    async signUp(input: SignUpRequest): Promise<{ user: User; session: IssuedSession }> {
      const passwordHash = await hashPassword(input.password);
      const created = await createOrClaim(input, passwordHash);
      if (!created.user.emailVerified) await emailVerification.sendFirstLink(created.user);
      return created;
    },

    /** Checks the password and starts a new session; the presented one (if any) is ended (rotation). */
    async signIn(input: SignInRequest, presentedToken: string | null): Promise<{ user: User; session: IssuedSession }> {
      const found = await repo.findUserByEmail(db, input.email);
      if (!found?.passwordHash) {
        await burnPasswordCheck(input.password);
        throw new AppError("invalid-credentials", "wrong e-mail or password");
      }
      if (!(await verifyPassword(found.passwordHash, input.password))) {
        throw new AppError("invalid-credentials", "wrong e-mail or password");
      }
      if (presentedToken) {
        const presented = sessionIdFromToken(presentedToken);
        await repo.deleteSession(db, presented);
        sessions.forgetSession(presented);
      }
      return { user: toUser(found), session: await issueSession(found.id) };
    },

    async signOut(token: string): Promise<void> {
      const sessionId = sessionIdFromToken(token);
      await repo.deleteSession(db, sessionId);
      sessions.forgetSession(sessionId);
    },

    /** Verifies an address by its mailed token; the user's cached sessions still say unverified. */
    async verifyEmail(token: string): Promise<{ email: string }> {
      const verified = await emailVerification.verify(token);
      // the token names no user here; verifications are rare, so every cached lookup goes
      sessions.clear();
      return verified;
    },

    /** The user behind a cookie, sliding the expiry when due; null when unknown or expired. */
    async authenticate(token: string): Promise<Authenticated | null> {
      const sessionId = sessionIdFromToken(token);
      const now = clock.now();
      let found = sessions.get(sessionId, now.getTime());
      if (!found) {
        const generation = sessions.generation();
        const row = await repo.findSessionWithUser(db, sessionId);
        if (!row) return null;
        found = { user: toUser(row.user), userId: row.user.id, expiresAt: row.session.expiresAt };
        sessions.set(sessionId, found, now.getTime(), generation);
      }
      const state = sessionState(found.expiresAt, now);
      if (state === "expired") {
        await repo.deleteSession(db, sessionId);
        sessions.forgetSession(sessionId);
        return null;
      }
      let renewedUntil: Date | null = null;
      if (state === "renew") {
        renewedUntil = sessionExpiry(now);
        await repo.updateSessionExpiry(db, sessionId, renewedUntil);
        sessions.set(sessionId, { ...found, expiresAt: renewedUntil }, now.getTime(), sessions.generation());
      }
      return { user: found.user, sessionId, renewedUntil };
    },

    /** Changes the password and ends every other session of the user (a stolen cookie stops working). */
    async changePassword(userId: string, sessionId: string, input: ChangePasswordRequest): Promise<void> {
      const user = await repo.findUserById(db, userId);
      if (!user?.passwordHash || !(await verifyPassword(user.passwordHash, input.currentPassword))) {
        throw new AppError("invalid-credentials", "the current password is wrong");
      }
      const passwordHash = await hashPassword(input.newPassword);
      await inTransaction(db, async (tx) => {
        await repo.updatePasswordHash(tx, userId, passwordHash);
        await repo.deleteOtherSessions(tx, userId, sessionId);
        await recordAudit(tx, { projectId: null, actorId: userId, action: "user.password-changed" });
      });
      sessions.forgetUser(userId);
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
