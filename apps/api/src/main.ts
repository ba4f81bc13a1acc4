import { pino } from "pino";
import { createApp } from "./app.js";
import { loadConfig } from "./config.js";
import { connectDatabase } from "./db/client.js";
import { createMailer } from "./mail/mailer.js";
import { createSolverPool } from "./solve/solverPool.js";

const config = loadConfig();
// In production the log goes through an asynchronous, buffered destination: a synchronous write per
// request line was the largest single cost of a small request (about a seventh of the server's CPU
// under load). What is still buffered is written out when the process exits.
const logDestination = config.env === "production" ? pino.destination({ sync: false, minLength: 4096 }) : null;
const logger = logDestination ? pino({ level: config.logLevel }, logDestination) : pino({ level: config.logLevel });
process.on("exit", () => {
  try {
    logDestination?.flushSync();
  } catch {
    // a write still in progress at exit: nothing more can be done without blocking
  }
});
const database = connectDatabase(config.databaseUrl);
const mailer = createMailer(config.mail);
if (config.mail.mode === "catcher") {
  await mailer.start();
  const { port } = await mailer.transport();
  logger.info(`local mail catcher (hand-offs, outbox) on 127.0.0.1:${port}`);
} else if (!config.mail.host) {
  logger.warn("SMTP_HOST is not set: hand-offs will fail until it is");
}
const solverPool = createSolverPool({ timeoutMs: config.solver.timeoutMs, ...(config.solver.threads ? { threads: config.solver.threads } : {}) });
const { app, services } = createApp({ config, database, engine: solverPool, logger, mailer });

const SWEEP_EVERY_MS = 60 * 60 * 1000;
async function sweepSessions(): Promise<void> {
  try {
    const deleted = await services.auth.sweepExpiredSessions();
    if (deleted > 0) logger.info({ deleted }, "expired sessions deleted");
    const links = await services.emailVerification.sweepExpired();
    if (links > 0) logger.info({ deleted: links }, "expired e-mail verification links deleted");
  } catch (error) {
    logger.warn({ err: error }, "sweeping expired sessions failed; will try again");
  }
}
void sweepSessions();
setInterval(() => void sweepSessions(), SWEEP_EVERY_MS).unref();

const server = app.listen(config.port, config.host, () => {
  logger.info(`Spanwright is listening on http://${config.host}:${config.port}`);
});

function shutdown(signal: string): void {
  logger.info({ signal }, "shutting down");
  server.close(() => {
    void Promise.allSettled([mailer.close(), database.close(), solverPool.close()]).finally(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on("SIGINT", () => shutdown("SIGINT"));
process.on("SIGTERM", () => shutdown("SIGTERM"));
