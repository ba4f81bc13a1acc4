import nodemailer from "nodemailer";
import type { SmtpOptions } from "@spanwright/handoff";

export interface VerificationMail {
  from: string;
  to: string;
  /** The recipient's name, as they signed up. */
  name: string;
  /** Absolute link to the web app's verify page, with the token. */
  link: string;
  /** How long the link works, in hours. */
  validHours: number;
}

export function verificationText(mail: VerificationMail): string {
  return [
    `Hello ${mail.name},`,
    "",
    "You created a Spanwright account with an e-mail address that project leads had invited.",
    "To join those projects, confirm that this address is yours:",
    "",
    mail.link,
    "",
    `The link works once, for ${mail.validHours} hours. If you did not create the account, ignore this e-mail:`,
    "without the link, the projects stay closed to whoever did.",
  ].join("\n");
}

/** Sends the verification e-mail (plain text, no attachments); rejects when the server refuses it. */
export async function sendVerificationMail(transportOptions: SmtpOptions, mail: VerificationMail): Promise<void> {
  const transport = nodemailer.createTransport(transportOptions);
  try {
    await transport.sendMail({
      from: mail.from,
      to: mail.to,
      subject: "Confirm your e-mail to join your Spanwright projects",
      text: verificationText(mail),
    });
  } finally {
    transport.close();
  }
}
