import { describe, expect, it } from "vitest";
import {
  generateSessionToken,
  sessionExpiry,
  sessionIdFromToken,
  sessionLifetimeMs,
  sessionRenewWithinMs,
  sessionState,
} from "./sessionToken.js";

describe("session tokens", () => {
  it("are 32 base32 characters (160 bits) and differ each time", () => {
    const a = generateSessionToken();
    expect(a).toMatch(/^[a-z2-7]{32}$/);
    expect(generateSessionToken()).not.toBe(a);
  });

  it("are stored as their SHA-256 in hex", () => {
    // SHA-256("abc") from FIPS 180-2, appendix B.1
    expect(sessionIdFromToken("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });
});

describe("sessionState", () => {
  const now = new Date("2026-03-01T12:00:00Z");
  const at = (ms: number) => new Date(now.getTime() + ms);
  it.each([
    ["a fresh session is valid", sessionLifetimeMs, "valid"],
    ["one just past half its life is renewed", sessionRenewWithinMs - 1, "renew"],
    ["one with half its life left is still valid", sessionRenewWithinMs, "valid"],
    ["one at its expiry is expired", 0, "expired"],
    ["one past its expiry is expired", -1, "expired"],
  ] as const)("%s", (_title, left, state) => {
    expect(sessionState(at(left), now)).toBe(state);
  });

  it("sets expiry 30 days ahead", () => {
    expect(sessionExpiry(now).toISOString()).toBe("2026-03-31T12:00:00.000Z");
  });
});
