import { describe, expect, it } from "vitest";
import { createSessionCache, type CachedSession } from "./sessionCache.js";

const session = (userId: string): CachedSession => ({
  userId,
  user: { id: userId, email: `${userId}@example.test`, name: userId, emailVerified: true },
  expiresAt: new Date(1_000_000),
});

describe("session cache", () => {
  it("keeps an entry for its time to live only, and never across a clock moved back", () => {
    const cache = createSessionCache({ ttlMs: 5000, maxEntries: 10 });
    cache.set("s1", session("u1"), 10_000, cache.generation());
    expect(cache.get("s1", 14_999)?.userId).toBe("u1");
    expect(cache.get("s1", 15_000)).toBeNull();
    cache.set("s2", session("u2"), 10_000, cache.generation());
    expect(cache.get("s2", 9_000)).toBeNull();
  });

  it("forgets one session, all of a user's sessions, or everything", () => {
    const cache = createSessionCache({ ttlMs: 5000, maxEntries: 10 });
    cache.set("a", session("u1"), 0, cache.generation());
    cache.set("b", session("u1"), 0, cache.generation());
    cache.set("c", session("u2"), 0, cache.generation());
    cache.forgetSession("a");
    expect(cache.get("a", 1)).toBeNull();
    cache.forgetUser("u1");
    expect(cache.get("b", 1)).toBeNull();
    expect(cache.get("c", 1)?.userId).toBe("u2");
    cache.clear();
    expect(cache.get("c", 1)).toBeNull();
  });

  it("keeps nothing from a lookup that began before a removal", () => {
    const cache = createSessionCache({ ttlMs: 5000, maxEntries: 10 });
    const before = cache.generation();
    cache.forgetSession("s1"); // a sign-out while the lookup was reading the old row
    cache.set("s1", session("u1"), 0, before);
    expect(cache.get("s1", 1)).toBeNull();
  });

  it("holds at most maxEntries, dropping the oldest first", () => {
    const cache = createSessionCache({ ttlMs: 5000, maxEntries: 2 });
    cache.set("a", session("u1"), 0, cache.generation());
    cache.set("b", session("u2"), 0, cache.generation());
    cache.set("c", session("u3"), 0, cache.generation());
    expect(cache.get("a", 1)).toBeNull();
    expect(cache.get("b", 1)?.userId).toBe("u2");
    expect(cache.get("c", 1)?.userId).toBe("u3");
  });
});
