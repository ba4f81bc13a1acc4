import { apiRoutes, type OutboxMessage, type OutboxResponse } from "@spanwright/contracts";
import type { Router } from "express";
import { and, eq } from "drizzle-orm";
import { membershipCounts } from "../access/access.repo.js";
import { requireAuth } from "../auth/sessionCookie.js";
import type { Db } from "../db/client.js";
import { projectMembers, users } from "../db/schema.js";
import { AppError } from "../http/appError.js";
import type { Mailer } from "../mail/mailer.js";

async function ownsAnyProject(db: Db, userId: string): Promise<boolean> {
  const rows = await db
    .select({ role: projectMembers.role })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.userId, userId), membershipCounts));
  return rows.some((r) => r.role === "owner");
}

/**
 * The outbox: what the local SMTP fake caught, newest first, for owners of any project. Off in
 * production (404, as if the route did not exist) unless OUTBOX_ENABLED, and whenever mail goes to
 * a real server.
 */
export function registerOutboxRoutes(router: Router, deps: { db: Db; mailer: Mailer; enabled: boolean }): void {
  router.get(apiRoutes.outbox.path, async (_req, res) => {
    if (!deps.enabled || deps.mailer.mode !== "catcher") throw new AppError("not-found", "no such API route");
    const { user } = requireAuth(res);
    if (!(await ownsAnyProject(deps.db, user.id))) throw new AppError("forbidden", "the outbox is for project owners");
    const caught = (await deps.mailer.caught()) ?? [];
    const messages = caught
      .map((m): OutboxMessage => ({
        id: m.id,
        receivedAt: m.receivedAt,
        messageId: m.messageId,
        from: m.from,
        to: m.to,
        subject: m.subject,
        text: m.text,
        attachments: m.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, size: a.size })),
      }))
      .reverse();
    res.json({ messages } satisfies OutboxResponse);
  });
}
