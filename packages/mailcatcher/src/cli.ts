import { startMailCatcher } from "./mailCatcher.js";

/**
 * Runs the mail catcher on its own for development:
 *   SPANWRIGHT_SMTP_PORT=2525 SPANWRIGHT_OUTBOX_FILE=.data/outbox.json pnpm --filter @spanwright/mailcatcher start
 * Port 0 (the default) picks a free one; the chosen port is printed. Ctrl-C stops it.
 */
const port = Number(process.env.SPANWRIGHT_SMTP_PORT ?? 0);
const storeFile = process.env.SPANWRIGHT_OUTBOX_FILE;
const catcher = await startMailCatcher({ port, host: "127.0.0.1", ...(storeFile ? { storeFile } : {}) });
console.log(`mail catcher listening on smtp://${catcher.host}:${catcher.port}${storeFile ? `, storing in ${storeFile}` : ""}`);
const stop = () => {
  void catcher.close().then(() => process.exit(0));
};
process.once("SIGINT", stop);
process.once("SIGTERM", stop);
