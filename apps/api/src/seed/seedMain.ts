import { createServices } from "../app.js";
import { systemClock } from "../clock.js";
import { loadConfig } from "../config.js";
import { connectDatabase } from "../db/client.js";
import { createMailer } from "../mail/mailer.js";
import { solverEngine } from "../solve/solverEngine.js";
import { demoEmail, demoPassword, demoProjectName, seedDemo } from "./seed.js";

const config = loadConfig();
const database = connectDatabase(config.databaseUrl, { max: 2 });
try {
  // the demo sends no mail; the mailer is never started
  const mailer = createMailer(config.mail);
  const services = createServices({ database, engine: solverEngine, clock: systemClock, mailer, publicUrl: config.publicUrl });
  const { created } = await seedDemo(services, database.db);
  console.log(created ? `seed: created the demo project "${demoProjectName}"` : "seed: demo data already present");
  console.log(`seed: demo sign-in ${demoEmail} / ${demoPassword}`);
} finally {
  await database.close();
}
