import { startMailCatcher, type CaughtMessage, type MailCatcher } from "@spanwright/mailcatcher";
import type { SmtpOptions } from "@spanwright/handoff";
import type { MailConfig } from "../config.js";
import { AppError } from "../http/appError.js";

/**
 * Where hand-off mail goes. In `catcher` mode (development, tests, the local demo) the API starts
 * the local SMTP fake on 127.0.0.1 itself, on first use or at `start()`, and stops it on `close()`;
 * its caught messages feed the outbox. In `smtp` mode the settings come from the environment and
 * there is no outbox.
 */
export interface Mailer {
  readonly mode: MailConfig["mode"];
  readonly from: string;
  /** Starts the catcher if this mailer has one (idempotent). */
  start(): Promise<void>;
  /** nodemailer transport options for the configured server. */
  transport(): Promise<SmtpOptions>;
  /** Caught messages, oldest first; null when there is no catcher. */
  caught(): Promise<CaughtMessage[] | null>;
  close(): Promise<void>;
}

// A hung SMTP server must not hold a request for minutes (nodemailer's defaults are 2–10 min).
const TIMEOUTS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 } as const;

export function createMailer(config: MailConfig): Mailer {
  if (config.mode === "smtp") {
    return {
      mode: "smtp",
      from: config.from,
      start: async () => {},
      async transport() {
        if (!config.host) throw new AppError("mail-failed", "no SMTP server is configured (SMTP_HOST)");
        return {
          host: config.host,
          port: config.port,
          secure: config.secure,
          ...(config.user ? { auth: { user: config.user, pass: config.pass ?? "" } } : {}),
          ...TIMEOUTS,
        };
      },
      caught: async () => null,
      close: async () => {},
    };
  }

  let catcher: Promise<MailCatcher> | null = null;
  const ensure = () => (catcher ??= startMailCatcher({ host: "127.0.0.1", port: config.port }));
  return {
    mode: "catcher",
    from: config.from,
    async start() {
      await ensure();
    },
    async transport() {
      const c = await ensure();
      // the catcher speaks plain SMTP on loopback only: no TLS, no auth
      return { host: c.host, port: c.port, secure: false, ignoreTLS: true, ...TIMEOUTS };
    },
    async caught() {
      return (await ensure()).messages();
    },
    async close() {
      if (!catcher) return;
      const started = catcher;
      catcher = null;
      await (await started).close();
    },
  };
}
