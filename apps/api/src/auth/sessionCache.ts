import type { User } from "@spanwright/contracts";

/** What a session lookup found: the user and when the session expires. */
export interface CachedSession {
  user: User;
  userId: string;
  expiresAt: Date;
}

/**
 * Session lookups of the last few seconds, so a busy client's requests do not each cost a database
 * round trip (the load test's solve route spent a sixth of its time there). Exact within this
 * process: signing out, rotation at sign-in, a password change and an e-mail verification remove
 * what they change before they answer. Another API process sees a sign-out within `ttlMs`; the
 * sessions table stays the truth (expiry is checked on every hit, and renewals are written through).
 */
export interface SessionCache {
  get(sessionId: string, nowMs: number): CachedSession | null;
  /**
   * Counts removals: read it before a database lookup and pass it to set(), which keeps nothing
   * when something was removed meanwhile (a lookup that raced a sign-out must not bring it back).
   */
  generation(): number;
  set(sessionId: string, session: CachedSession, nowMs: number, generation: number): void;
  forgetSession(sessionId: string): void;
  forgetUser(userId: string): void;
  clear(): void;
}

export function createSessionCache(options: { ttlMs: number; maxEntries: number }): SessionCache {
  const entries = new Map<string, { session: CachedSession; cachedAt: number }>();
  let removals = 0;
  return {
    generation: () => removals,
    get(sessionId, nowMs) {
      const entry = entries.get(sessionId);
      if (!entry) return null;
      // a clock moved back (tests) or an entry past its time: look again
      if (nowMs < entry.cachedAt || nowMs - entry.cachedAt >= options.ttlMs) {
        entries.delete(sessionId);
        return null;
      }
      return entry.session;
    },
    set(sessionId, session, nowMs, generation) {
      if (generation !== removals) return;
      entries.delete(sessionId);
      entries.set(sessionId, { session, cachedAt: nowMs });
      // Map keeps insertion order: the first key is the oldest entry
      while (entries.size > options.maxEntries) entries.delete(entries.keys().next().value!);
    },
    forgetSession(sessionId) {
      removals++;
      entries.delete(sessionId);
    },
    forgetUser(userId) {
      removals++;
      for (const [id, entry] of entries) if (entry.session.userId === userId) entries.delete(id);
    },
    clear() {
      removals++;
      entries.clear();
    },
  };
}
