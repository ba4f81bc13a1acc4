import { drizzle, type PostgresJsQueryResultHKT } from "drizzle-orm/postgres-js";
import type { PgDatabase } from "drizzle-orm/pg-core";
import postgres from "postgres";
import * as schema from "./schema.js";

/** A database handle or an open transaction: repositories accept either. */
export type Db = PgDatabase<PostgresJsQueryResultHKT, typeof schema>;

export interface Database {
  readonly db: Db;
  /** Cheap liveness probe for the health route. */
  ping(): Promise<boolean>;
  close(): Promise<void>;
}

export function connectDatabase(url: string, options: { max?: number } = {}): Database {
  const client = postgres(url, {
    max: options.max ?? 10,
    connect_timeout: 5,
    // postgres.js waits up to 20 s between reconnects after failures; during an outage requests
    // would queue behind that wait instead of failing with 503, and recovery would lag as long
    backoff: (retries: number) => Math.min(0.05 * 2 ** retries, 0.5),
    onnotice: () => {},
  });
  const db = drizzle(client, { schema });
  return {
    db,
    async ping() {
      try {
        await client`select 1`;
        return true;
      } catch {
        return false;
      }
    },
    close: () => client.end({ timeout: 5 }),
  };
}

/** Runs `work` in one transaction; services use this for writes spanning several tables. */
export function inTransaction<T>(db: Db, work: (tx: Db) => Promise<T>): Promise<T> {
  return db.transaction((tx) => work(tx));
}
