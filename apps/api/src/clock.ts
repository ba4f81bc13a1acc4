/** Time source, injected so tests can move it (session expiry). */
export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };
