import path from "node:path";
import { fileURLToPath } from "node:url";
import { z } from "zod";

const here = path.dirname(fileURLToPath(import.meta.url));
const defaultPgPort = process.env.SPANWRIGHT_PG_PORT ?? "15432";

const envSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default("127.0.0.1"),
  /** Same default as `scripts/db.sh url`. */
  DATABASE_URL: z.string().url().default(`postgres://spanwright@127.0.0.1:${defaultPgPort}/spanwright`),
  SESSION_COOKIE_NAME: z.string().regex(/^[A-Za-z0-9_-]+$/).default("spanwright_session"),
  /** Express "trust proxy": set when behind a TLS-terminating proxy so Secure cookies are sent. */
  TRUST_PROXY: z.string().default("false"),
  /** Extra origins allowed to make state-changing requests, comma separated (the Host's own is always allowed). */
  ALLOWED_ORIGINS: z.string().default(""),
  /** Sign-in and sign-up attempts per client address per window. */
  AUTH_RATE_LIMIT: z.coerce.number().int().positive().default(20),
  AUTH_RATE_WINDOW_MS: z.coerce.number().int().positive().default(15 * 60 * 1000),
  /** The built web app, served with an SPA fallback when SERVE_WEB is on (default: in production). */
  WEB_DIST_DIR: z.string().default(path.resolve(here, "../../web/dist")),
  SERVE_WEB: z.enum(["true", "false"]).optional(),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "trace", "silent"]).default("info"),
  /** `catcher`: the API starts the local SMTP fake on 127.0.0.1 (default outside production). */
  SMTP_MODE: z.enum(["catcher", "smtp"]).optional(),
  SMTP_HOST: z.string().optional(),
  /** For `smtp`: the server's port (default 587). For `catcher`: its port, 0 = any free port. */
  SMTP_PORT: z.coerce.number().int().min(0).max(65535).optional(),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  /** TLS from the first byte (port 465); otherwise STARTTLS when the server offers it. */
  SMTP_SECURE: z.enum(["true", "false"]).default("false"),
  SMTP_FROM: z.string().default("Spanwright <handoffs@spanwright.test>"),
  /** The outbox page of caught messages; on by default outside production. */
  OUTBOX_ENABLED: z.enum(["true", "false"]).optional(),
  /** Base of links in e-mails (the revision a hand-off points at). */
  PUBLIC_URL: z.string().url().optional(),
  /** Longest one solve may run on a solver thread before it is stopped (422 too-large). */
  SOLVE_TIMEOUT_MS: z.coerce.number().int().positive().default(5000),
  /** Solver threads; default: the cores available less one (the event loop's), at least one. */
  SOLVER_THREADS: z.coerce.number().int().positive().optional(),
});

export interface Config {
  readonly env: "development" | "production" | "test";
  readonly port: number;
  readonly host: string;
  readonly databaseUrl: string;
  readonly sessionCookieName: string;
  readonly trustProxy: boolean | number | string;
  readonly allowedOrigins: readonly string[];
  readonly authRateLimit: number;
  readonly authRateWindowMs: number;
  readonly webDistDir: string;
  readonly serveWeb: boolean;
  readonly logLevel: string;
  readonly mail: MailConfig;
  readonly outboxEnabled: boolean;
  /** No trailing slash. */
  readonly publicUrl: string;
  readonly solver: { readonly timeoutMs: number; readonly threads: number | null };
}

export type MailConfig =
  | { readonly mode: "catcher"; readonly port: number; readonly from: string }
  | {
      readonly mode: "smtp";
      /** Unset: hand-offs answer 502 `mail-failed` until SMTP_HOST is given. */
      readonly host: string | null;
      readonly port: number;
      readonly secure: boolean;
      readonly user: string | null;
      readonly pass: string | null;
      readonly from: string;
    };

function parseMail(e: z.infer<typeof envSchema>): MailConfig {
  const mode = e.SMTP_MODE ?? (e.NODE_ENV === "production" ? "smtp" : "catcher");
  if (mode === "catcher") return { mode, port: e.SMTP_PORT ?? 0, from: e.SMTP_FROM };
  return {
    mode,
    host: e.SMTP_HOST || null,
    port: e.SMTP_PORT ?? 587,
    secure: e.SMTP_SECURE === "true",
    user: e.SMTP_USER || null,
    pass: e.SMTP_PASS || null,
    from: e.SMTP_FROM,
  };
}

function parseTrustProxy(value: string): boolean | number | string {
  if (value === "true") return true;
  if (value === "false") return false;
  return /^\d+$/.test(value) ? Number(value) : value;
}

/** Reads the environment once; throws a readable message naming each bad variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new Error(`invalid configuration:\n${lines.join("\n")}`);
  }
  const e = parsed.data;
  return {
    env: e.NODE_ENV,
    port: e.PORT,
    host: e.HOST,
    databaseUrl: e.DATABASE_URL,
    sessionCookieName: e.SESSION_COOKIE_NAME,
    trustProxy: parseTrustProxy(e.TRUST_PROXY),
    allowedOrigins: e.ALLOWED_ORIGINS.split(",").map((s) => s.trim()).filter(Boolean),
    authRateLimit: e.AUTH_RATE_LIMIT,
    authRateWindowMs: e.AUTH_RATE_WINDOW_MS,
    webDistDir: e.WEB_DIST_DIR,
    serveWeb: e.SERVE_WEB ? e.SERVE_WEB === "true" : e.NODE_ENV === "production",
    logLevel: e.LOG_LEVEL,
    mail: parseMail(e),
    outboxEnabled: e.OUTBOX_ENABLED ? e.OUTBOX_ENABLED === "true" : e.NODE_ENV !== "production",
    publicUrl: (e.PUBLIC_URL ?? `http://${e.HOST}:${e.PORT}`).replace(/\/+$/, ""),
    solver: { timeoutMs: e.SOLVE_TIMEOUT_MS, threads: e.SOLVER_THREADS ?? null },
  };
}
