import { pino } from "pino";
import { createApp } from "./app.js";
import { loadConfig } from "./config.js";
import { connectDatabase } from "./db/client.js";
import { solverEngine } from "./solve/solverEngine.js";

const config = loadConfig();
const logger = pino({ level: config.logLevel });
const database = connectDatabase(config.databaseUrl);
const { app } = createApp({ config, database, engine: solverEngine, logger });

const server = app.listen(config.port, config.host, () => {
  logger.info(`Spanwright is listening on http://${config.host}:${config.port}`);
});

function shutdown(signal: string): void {
  logger.info({ signal }, "shutting down");
  server.close(() => {
    void database.close().finally(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on("SIGINT", () => shutdown("SIGINT"));
process.on("SIGTERM", () => shutdown("SIGTERM"));
