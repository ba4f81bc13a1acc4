import type { Db } from "./client.js";

/**
 * A query built once per database handle and reused: drizzle otherwise rebuilds the SQL text of a
 * query on every call, a measurable share of a small request's CPU on the hottest lookups (the
 * session on every request, the member's role on every project route). Keyed weakly, so a test's
 * handle and its statements go together; a transaction handle simply builds its own.
 */
export function preparedQuery<Q>(build: (db: Db) => Q): (db: Db) => Q {
  const cache = new WeakMap<Db, Q>();
  return (db) => {
    let query = cache.get(db);
    if (!query) {
      query = build(db);
      cache.set(db, query);
    }
    return query;
  };
}
