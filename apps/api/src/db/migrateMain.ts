import { loadConfig } from "../config.js";
import { migrateDatabase } from "./migrate.js";

const config = loadConfig();
await migrateDatabase(config.databaseUrl);
console.log("migrate: database is up to date");
