import type { Mailer } from "../mail/mailer.js";

/**
 * The newest e-mail verification link the local catcher received for `email` (tests and the
 * browser suite follow it as the user would), or null when none came.
 */
export async function findVerificationLink(mailer: Mailer, email: string): Promise<URL | null> {
  const caught = (await mailer.caught()) ?? [];
  for (const message of [...caught].reverse()) {
    if (!message.to.some((to) => to.toLowerCase().includes(email.toLowerCase()))) continue;
    const match = /https?:\/\/\S+\/verify-email\?token=\S+/.exec(message.text ?? "");
    if (match) return new URL(match[0]);
  }
  return null;
}

/** The token of the newest verification link to `email`; throws when there is none. */
export async function verificationToken(mailer: Mailer, email: string): Promise<string> {
  const link = await findVerificationLink(mailer, email);
  const token = link?.searchParams.get("token");
  if (!token) throw new Error(`no verification e-mail to ${email} in the catcher`);
  return token;
}
