import type { CreateHandoffRequest, Handoff } from "@spanwright/contracts";
import { buildReactionTable, HandoffMailError, sendHandoffMail, staleReactions, type ReactionTable } from "@spanwright/handoff";
import type { Logger } from "pino";
import { authorize } from "../access/access.js";
import { recordAudit } from "../audit/audit.repo.js";
import type { BeamsService } from "../beams/beams.service.js";
import type { Clock } from "../clock.js";
import { inTransaction, type Db } from "../db/client.js";
import { revisionCsv, revisionPdf } from "../exports/revisionFiles.js";
import { AppError } from "../http/appError.js";
import type { Mailer } from "../mail/mailer.js";
import { asBeamModel, asSolveResult, findProjectInfo, loadRevisionContext } from "../revisions/revisionContext.js";
import { findRevision } from "../revisions/revisions.repo.js";
import * as repo from "./handoffs.repo.js";

interface Recipient {
  email: string;
  userId: string | null;
}

/**
 * Hand-offs to the foundation designer. Order of work: check and resolve everything, render the
 * CSV and PDF, send the mail, and only when the SMTP server accepted it record the hand-off and
 * mark the revision issued, in one transaction. So a recorded hand-off always stands for a mail
 * that left; the opposite gap (mail accepted, then the database write fails) is logged with the
 * message id, since a sent mail cannot be called back.
 */
export function createHandoffsService(deps: { db: Db; clock: Clock; beams: BeamsService; mailer: Mailer; publicUrl: string; logger?: Logger }) {
  const { db, clock, beams, mailer } = deps;

  /** Viewer members by id; any address, linked to its member if it is one. */
  async function resolveRecipients(projectId: string, input: CreateHandoffRequest["recipients"]): Promise<Recipient[]> {
    const userIds = input.flatMap((r) => ("userId" in r ? [r.userId.toLowerCase()] : []));
    const emails = input.flatMap((r) => ("email" in r ? [r.email] : []));
    const contacts = await repo.findMemberContacts(db, projectId, { userIds, emails });
    const out = new Map<string, Recipient>();
    for (const userId of userIds) {
      const member = contacts.find((c) => c.userId === userId);
      if (!member || member.role !== "viewer") {
        throw new AppError("invalid-recipient", "member recipients must be members of this project with the viewer role", { recipient: userId });
      }
      out.set(member.email, { email: member.email, userId: member.userId });
    }
    for (const email of emails) {
      if (!out.has(email)) out.set(email, { email, userId: contacts.find((c) => c.email === email)?.userId ?? null });
    }
    return [...out.values()];
  }

  /** Reaction tables by revision id, so a history of many hand-offs builds each table once. */
  function tableCache() {
    const cache = new Map<string, ReactionTable | null>();
    return async (beamId: string, version: number): Promise<ReactionTable | null> => {
      const key = `${beamId}/${version}`;
      if (!cache.has(key)) {
        const r = await findRevision(db, beamId, version);
        cache.set(key, r ? buildReactionTable(asBeamModel(r.model), asSolveResult(r.result)) : null);
      }
      return cache.get(key)!;
    };
  }

  /** `records` newest first, as the repository returns them. */
  async function withStale(records: repo.HandoffRecord[], thresholdPct: number): Promise<Handoff[]> {
    const tableOf = tableCache();
    const out: Handoff[] = [];
    // addresses that already appeared in a newer hand-off of the same beam
    const reissued = new Set<string>();
    for (const { beamLatestVersion, revisionId: _r, issuedAt, recipients, ...h } of records) {
      let changed = 0;
      let stale = false;
      if (beamLatestVersion > h.version) {
        const issued = await tableOf(h.beamId, h.version);
        const latest = await tableOf(h.beamId, beamLatestVersion);
        if (issued && latest) {
          const verdict = staleReactions(issued, latest, thresholdPct);
          stale = verdict.stale;
          changed = verdict.changed.length;
        }
      }
      const withStatus = recipients.map((r) => ({ ...r, outdated: stale && !reissued.has(`${h.beamId} ${r.email}`) }));
      for (const r of recipients) reissued.add(`${h.beamId} ${r.email}`);
      out.push({ ...h, recipients: withStatus, issuedAt: issuedAt.toISOString(), latestVersion: beamLatestVersion, stale, staleValueCount: changed });
    }
    return out;
  }

  async function list(actorId: string, projectId: string, beamId?: string): Promise<Handoff[]> {
    await authorize(db, projectId, actorId, "read");
    if (beamId) await beams.requireBeam(db, projectId, beamId);
    const project = await findProjectInfo(db, projectId);
    if (!project) throw new AppError("not-found", "project not found");
    return withStale(await repo.listHandoffs(db, projectId, beamId), project.compareThresholdPercent);
  }

  return {
    list,

    async create(actorId: string, ids: { projectId: string; beamId: string; version: number }, input: CreateHandoffRequest): Promise<Handoff> {
      const ctx = await loadRevisionContext(db, actorId, ids, "edit");
      const recipients = await resolveRecipients(ids.projectId, input.recipients);
      const issuer = (await repo.findUserName(db, actorId)) ?? "a project engineer";
      const csv = revisionCsv(ctx, "project");
      const pdf = await revisionPdf(ctx);
      let sent;
      try {
        sent = await sendHandoffMail(await mailer.transport(), {
          from: mailer.from,
          to: recipients.map((r) => r.email),
          project: ctx.project.name,
          beam: ctx.beam.name,
          revision: ctx.revision.version,
          // the web app's read-only revision page
          revisionUrl: `${deps.publicUrl}/projects/${ids.projectId}/beams/${ids.beamId}/revisions/${ids.version}`,
          issuedBy: issuer,
          csv: { filename: csv.filename, content: csv.content },
          pdf: { filename: pdf.filename, content: pdf.content },
          ...(input.message ? { note: input.message } : {}),
        });
      } catch (error) {
        if (error instanceof HandoffMailError) throw new AppError("mail-failed", `the mail server did not accept the hand-off: ${error.message}`);
        throw error;
      }
      const accepted = new Set(sent.accepted.map((a) => a.toLowerCase()));
      const delivered = recipients.filter((r) => accepted.has(r.email));
      if (delivered.length === 0) throw new AppError("mail-failed", "the mail server refused every recipient", { rejected: sent.rejected });

      const now = clock.now();
      try {
        await inTransaction(db, async (tx) => {
          await repo.insertHandoff(
            tx,
            { projectId: ids.projectId, beamId: ids.beamId, revisionId: ctx.revision.id, issuedById: actorId, message: input.message ?? null, messageId: sent.messageId, now },
            delivered,
          );
          await repo.markIssued(tx, ctx.revision.id);
          await recordAudit(tx, {
            projectId: ids.projectId,
            actorId,
            action: "revision.issued",
            details: { beamId: ids.beamId, version: ids.version, messageId: sent.messageId, recipients: delivered.map((r) => r.email) },
          });
        });
      } catch (error) {
        deps.logger?.error({ err: error, messageId: sent.messageId }, "hand-off mail was sent but could not be recorded");
        throw error;
      }
      const [created] = (await list(actorId, ids.projectId, ids.beamId)).filter((h) => h.messageId === sent.messageId);
      if (!created) throw new Error("recorded hand-off not found");
      return created;
    },
  };
}

export type HandoffsService = ReturnType<typeof createHandoffsService>;
