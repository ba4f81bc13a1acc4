import nodemailer from "nodemailer";
import type SMTPTransport from "nodemailer/lib/smtp-transport/index.js";
import { CAUTION } from "./pdfReport.js";

/**
 * The hand-off e-mail: a revision's reaction table (CSV) and calculation report (PDF) sent to the
 * foundation designer with a link back to the revision. SMTP settings come from the caller: the
 * local mail catcher in development and tests, environment variables in production.
 */

export type SmtpOptions = SMTPTransport.Options;

export interface HandoffAttachment {
  filename: string;
  content: Buffer | string;
}

export interface HandoffMail {
  from: string;
  to: string[];
  project: string;
  beam: string;
  revision: number | string;
  /** Absolute URL of the revision, opened read-only by viewers. */
  revisionUrl: string;
  /** Who issues it, shown in the text. */
  issuedBy: string;
  csv: HandoffAttachment;
  pdf: HandoffAttachment;
  /** Optional note from the engineer, placed above the link. */
  note?: string;
}

export interface SentHandoff {
  messageId: string;
  accepted: string[];
  rejected: string[];
}

export function handoffSubject(mail: Pick<HandoffMail, "project" | "beam" | "revision">): string {
  return `Support reactions: ${mail.project}, ${mail.beam}, revision ${mail.revision}`;
}

export function handoffText(mail: HandoffMail): string {
  return [
    `Support reactions for ${mail.beam} (${mail.project}), revision ${mail.revision}, issued by ${mail.issuedBy}.`,
    "",
    ...(mail.note ? [mail.note, ""] : []),
    `Open the revision: ${mail.revisionUrl}`,
    "",
    `Attached: ${mail.csv.filename} (reaction table) and ${mail.pdf.filename} (calculation report).`,
    "Reactions are the forces the supports exert on the beam, Fy positive upward; negative Fy is uplift.",
    "",
    CAUTION,
  ].join("\n");
}

export type HandoffMailErrorCode = "no-recipients" | "send-failed";

export class HandoffMailError extends Error {
  constructor(
    readonly code: HandoffMailErrorCode,
    message: string,
  ) {
    super(message);
    this.name = "HandoffMailError";
  }
}

const asAddresses = (list: Array<string | { address: string }>) =>
  list.map((a) => (typeof a === "string" ? a : a.address));

/** Sends the hand-off e-mail; resolves with the message id to record beside the hand-off. */
export async function sendHandoffMail(transportOptions: SmtpOptions, mail: HandoffMail): Promise<SentHandoff> {
  if (mail.to.length === 0) throw new HandoffMailError("no-recipients", "a hand-off needs at least one recipient");
  const transport = nodemailer.createTransport(transportOptions);
  try {
    const info = await transport.sendMail({
      from: mail.from,
      to: mail.to,
      subject: handoffSubject(mail),
      text: handoffText(mail),
      attachments: [
        { filename: mail.csv.filename, content: mail.csv.content, contentType: "text/csv; charset=utf-8" },
        { filename: mail.pdf.filename, content: mail.pdf.content, contentType: "application/pdf" },
      ],
    });
    return { messageId: info.messageId, accepted: asAddresses(info.accepted), rejected: asAddresses(info.rejected) };
  } catch (error) {
    throw new HandoffMailError("send-failed", (error as Error).message);
  } finally {
    transport.close();
  }
}
