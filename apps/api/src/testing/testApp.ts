import type { Express } from "express";
import { inject } from "vitest";
import { createApp, type Services } from "../app.js";
import { loadConfig, type Config } from "../config.js";
import { connectDatabase, type Database } from "../db/client.js";
import type { Engine } from "../solve/engine.js";
import { solverEngine } from "../solve/solverEngine.js";
import { Client, testOrigin } from "./client.js";
import { createTestClock, type TestClock } from "./testClock.js";
import { createTestDatabase, type TestDatabase } from "./testDatabase.js";

export interface TestApp {
  app: Express;
  services: Services;
  database: Database;
  testDatabase: TestDatabase;
  clock: TestClock;
  config: Config;
  client(): Client;
  /** Signs up a new account (through the API) and returns a client holding its session. */
  signUp(name: string, email?: string, password?: string): Promise<{ client: Client; userId: string; email: string; password: string }>;
  close(): Promise<void>;
}

let counter = 0;
export const uniqueEmail = (name: string): string =>
  `${name.toLowerCase().replace(/[^a-z0-9]+/g, ".")}.${process.pid}.${++counter}@example.test`;

export const testPassword = "correct horse battery staple";

export function testConfig(databaseUrl: string, env: Record<string, string> = {}): Config {
  return loadConfig({
    NODE_ENV: "test",
    DATABASE_URL: databaseUrl,
    ALLOWED_ORIGINS: testOrigin,
    AUTH_RATE_LIMIT: "100000",
    LOG_LEVEL: "silent",
    SERVE_WEB: "false",
    ...env,
  });
}

/** An app on its own fresh database (copied from the run's template). Call close() in afterAll. */
export async function createTestApp(options: { env?: Record<string, string>; engine?: Engine } = {}): Promise<TestApp> {
  const testDatabase = await createTestDatabase(inject("templateDatabase"), inject("databasePrefix"));
  const config = testConfig(testDatabase.url, options.env);
  const database = connectDatabase(config.databaseUrl, { max: 5 });
  const clock = createTestClock();
  const { app, services } = createApp({ config, database, engine: options.engine ?? solverEngine, clock });
  const client = () => new Client(app);
  return {
    app,
    services,
    database,
    testDatabase,
    clock,
    config,
    client,
    async signUp(name, email = uniqueEmail(name), password = testPassword) {
      const c = client();
      const res = await c.post("/api/auth/sign-up", { email, name, password });
      if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
      return { client: c, userId: res.body.user.id as string, email, password };
    },
    async close() {
      await services.mailer.close();
      await database.close();
      await testDatabase.drop();
    },
  };
}

/** What the global setup (globalSetup.ts) hands to each test file. */
declare module "vitest" {
  export interface ProvidedContext {
    templateDatabase: string;
    databasePrefix: string;
  }
}
