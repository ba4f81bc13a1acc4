import path from "node:path";
import { fileURLToPath } from "node:url";
import { z } from "zod";

const here = path.dirname(fileURLToPath(import.meta.url));
const defaultPgPort = process.env.SPANWRIGHT_PG_PORT ?? "55432";

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
  };
}
