import type { VerifyEmailResponse } from "@spanwright/contracts";
import type { Logger } from "pino";
import { recordAudit } from "../audit/audit.repo.js";
import type { Clock } from "../clock.js";
import { inTransaction, type Db } from "../db/client.js";
import { AppError } from "../http/appError.js";
import type { Mailer } from "../mail/mailer.js";
import * as repo from "./emailVerification.repo.js";
import { generateSessionToken, sessionIdFromToken } from "./sessionToken.js";
import { sendVerificationMail } from "./verificationMail.js";

const hour = 60 * 60 * 1000;
/** A verification link works once, for 48 hours. */
export const verificationLifetimeMs = 48 * hour;

/**
 * Proof that a user owns their e-mail address, for accounts that took over an invitation's
 * placeholder: their invited memberships count only once the address is verified. The link carries
 * a random 160-bit token; only its SHA-256 is stored (as for sessions), so a leaked table opens
 * nothing. The link's base is the configured PUBLIC_URL, never the request's Host or Origin, so a
 * forged header cannot send the token elsewhere.
 */
export function createEmailVerificationService(deps: { db: Db; clock: Clock; mailer: Mailer; publicUrl: string; logger?: Logger }) {
  const { db, clock, mailer } = deps;

  /** Stores a new link for the user's address (earlier links stop working) and mails it. */
  async function sendLink(user: { id: string; email: string; name: string }): Promise<void> {
    const token = generateSessionToken();
    await repo.replaceEmailVerification(db, {
      id: sessionIdFromToken(token),
      userId: user.id,
      email: user.email,
      expiresAt: new Date(clock.now().getTime() + verificationLifetimeMs),
    });
    await sendVerificationMail(await mailer.transport(), {
      from: mailer.from,
      to: user.email,
      name: user.name,
      link: `${deps.publicUrl}/verify-email?token=${encodeURIComponent(token)}`,
      validHours: verificationLifetimeMs / hour,
    });
  }

  return {
    /**
     * Mails the first link after sign-up. The account exists and is signed in whatever happens
     * here, so a refused mail is logged, not thrown: the user can ask for another link.
     */
    async sendFirstLink(user: { id: string; email: string; name: string }): Promise<void> {
      try {
        await sendLink(user);
      } catch (error) {
        deps.logger?.error({ err: error, userId: user.id }, "verification e-mail not sent");
      }
    },

    /** A new link, on the signed-in user's request; nothing is sent when the address is verified. */
    async resend(user: { id: string; email: string; name: string; emailVerified?: boolean }): Promise<void> {
      if (user.emailVerified !== false) return;
      try {
        await sendLink(user);
      } catch (error) {
        if (error instanceof AppError) throw error;
        throw new AppError("mail-failed", "the verification e-mail could not be sent; try again later");
      }
    },

    /** Verifies the address the link was sent to. Each link works once. */
    async verify(token: string): Promise<VerifyEmailResponse> {
      const now = clock.now();
      return inTransaction(db, async (tx) => {
        const link = await repo.takeEmailVerification(tx, sessionIdFromToken(token));
        if (!link) {
          throw new AppError("verification-token-invalid", "this verification link is not valid, or was already used");
        }
        if (link.expiresAt.getTime() <= now.getTime()) {
          throw new AppError("verification-token-expired", "this verification link has expired; sign in and ask for a new one");
        }
        if (!(await repo.markEmailVerified(tx, link.userId, link.email, now))) {
          throw new AppError("verification-token-invalid", "this verification link is not valid, or was already used");
        }
        await recordAudit(tx, { projectId: null, actorId: link.userId, action: "user.email-verified" });
        return { email: link.email };
      });
    },

    sweepExpired(): Promise<number> {
      return repo.deleteExpiredEmailVerifications(db, clock.now());
    },
  };
}

export type EmailVerificationService = ReturnType<typeof createEmailVerificationService>;
