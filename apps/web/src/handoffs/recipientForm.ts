import {
  handoffRecipientInputSchema,
  type CreateHandoffRequest,
  type HandoffRecipient,
  type Member,
} from "@spanwright/contracts";

/**
 * The hand-off form's rules, apart from React: viewer members ticked, external addresses typed
 * (separated by commas, semicolons, spaces or lines, as people paste them from mail clients), an
 * optional message. Limits mirror the API's request schema so the form refuses what it would.
 */

export interface RecipientDraft {
  memberIds: readonly string[];
  emails: string;
  message: string;
}

export interface RecipientFormErrors {
  recipients?: string;
  emails?: string;
  message?: string;
}

export type RecipientFormResult =
  | { ok: true; request: CreateHandoffRequest }
  | { ok: false; errors: RecipientFormErrors };

export const MAX_RECIPIENTS = 20;
export const MAX_MESSAGE_LENGTH = 2000;

export function splitEmails(text: string): string[] {
  return text
    .split(/[\s,;]+/)
    .map((e) => e.trim())
    .filter((e) => e !== "");
}

/** Only viewers receive hand-offs among members (the API refuses others with invalid-recipient). */
export function eligibleMembers(members: readonly Member[]): Member[] {
  return members.filter((m) => m.role === "viewer");
}

export function validateRecipients(draft: RecipientDraft, members: readonly Member[]): RecipientFormResult {
  const errors: RecipientFormErrors = {};
  const chosen = eligibleMembers(members).filter((m) => draft.memberIds.includes(m.userId));
  const memberEmails = new Set(chosen.map((m) => m.email.toLowerCase()));

  const invalid: string[] = [];
  const emails: string[] = [];
  for (const raw of splitEmails(draft.emails)) {
    const parsed = handoffRecipientInputSchema.safeParse({ email: raw });
    if (!parsed.success || !("email" in parsed.data)) {
      invalid.push(raw);
      continue;
    }
    const email = parsed.data.email;
    // A typed address of a ticked member, or typed twice, is one recipient.
    if (!memberEmails.has(email) && !emails.includes(email)) emails.push(email);
  }
  if (invalid.length > 0) {
    errors.emails = `Not ${invalid.length === 1 ? "an e-mail address" : "e-mail addresses"}: ${invalid.join(", ")}`;
  }

  const total = chosen.length + emails.length;
  if (total === 0 && errors.emails === undefined) {
    errors.recipients = "Choose at least one viewer or type an e-mail address.";
  } else if (total > MAX_RECIPIENTS) {
    errors.recipients = `At most ${MAX_RECIPIENTS} recipients per hand-off; this has ${total}.`;
  }

  const message = draft.message.trim();
  if (message.length > MAX_MESSAGE_LENGTH) {
    errors.message = `The message is ${message.length} characters; the limit is ${MAX_MESSAGE_LENGTH}.`;
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };

  const request: CreateHandoffRequest = {
    recipients: [...chosen.map((m) => ({ userId: m.userId })), ...emails.map((email) => ({ email }))],
    ...(message !== "" ? { message } : {}),
  };
  return { ok: true, request };
}

/** Pre-fills a re-issue with the recipients of an earlier hand-off. */
export function draftFromRecipients(recipients: readonly HandoffRecipient[], members: readonly Member[]): RecipientDraft {
  const viewerIds = new Set(eligibleMembers(members).map((m) => m.userId));
  const memberIds = recipients.flatMap((r) => (r.userId !== null && viewerIds.has(r.userId) ? [r.userId] : []));
  const emails = recipients.filter((r) => r.userId === null || !viewerIds.has(r.userId)).map((r) => r.email);
  return { memberIds, emails: emails.join(", "), message: "" };
}
