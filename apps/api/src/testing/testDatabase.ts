import { randomBytes } from "node:crypto";
import postgres from "postgres";

const port = () => process.env.SPANWRIGHT_PG_PORT ?? "15432";

/** The maintenance database on the project's cluster, as superuser `spanwright` (trust on loopback). */
export const adminUrl = (): string => `postgres://spanwright@127.0.0.1:${port()}/postgres`;
export const databaseUrl = (name: string): string => `postgres://spanwright@127.0.0.1:${port()}/${name}`;

export interface TestDatabase {
  name: string;
  url: string;
  drop(): Promise<void>;
}

/** A private database for one test file, copied from the run's migrated template. */
export async function createTestDatabase(template: string, prefix: string): Promise<TestDatabase> {
  const name = `${prefix}_${randomBytes(4).toString("hex")}`;
  const admin = postgres(adminUrl(), { max: 1, onnotice: () => {} });
  try {
    await admin.unsafe(`CREATE DATABASE "${name}" TEMPLATE "${template}"`);
  } finally {
    await admin.end();
  }
  return {
    name,
    url: databaseUrl(name),
    async drop() {
      const a = postgres(adminUrl(), { max: 1, onnotice: () => {} });
      try {
        await a.unsafe(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      } finally {
        await a.end();
      }
    },
  };
}
