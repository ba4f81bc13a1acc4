import type { Clock } from "../clock.js";

/** A clock tests can move forward (session expiry, renewal). */
export interface TestClock extends Clock {
  advance(ms: number): void;
}

export function createTestClock(): TestClock {
  let offset = 0;
  return {
    now: () => new Date(Date.now() + offset),
    advance(ms) {
      offset += ms;
    },
  };
}
