import { randomBytes } from "node:crypto";
import postgres from "postgres";
import type { TestProject } from "vitest/node";
import { migrateDatabase } from "../db/migrate.js";
import { adminUrl, databaseUrl } from "./testDatabase.js";

/**
 * Once per test run: a fresh template database, migrated; each test file then copies it with
 * CREATE DATABASE ... TEMPLATE (fast: a file copy, no migrations). Everything with this run's
 * prefix is dropped at the end, so parallel or aborted runs never share state.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const prefix = `spanwright_test_${randomBytes(4).toString("hex")}`;
  const template = `${prefix}_tmpl`;
  const admin = postgres(adminUrl(), { max: 1, onnotice: () => {} });
  try {
    await admin.unsafe(`CREATE DATABASE "${template}"`);
  } catch (error) {
    await admin.end();
    throw new Error(
      `cannot reach the test PostgreSQL at ${adminUrl()} (start it with: bash scripts/db.sh start): ${String(error)}`,
    );
  }
  await migrateDatabase(databaseUrl(template));
  project.provide("templateDatabase", template);
  project.provide("databasePrefix", prefix);

  return async () => {
    const rows = await admin<{ datname: string }[]>`
      SELECT datname FROM pg_database WHERE datname LIKE ${`${prefix}%`} ORDER BY datname DESC`;
    for (const { datname } of rows) await admin.unsafe(`DROP DATABASE IF EXISTS "${datname}" WITH (FORCE)`);
    await admin.end();
  };
}
