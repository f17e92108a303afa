// A frozen wall clock for expiry tests: only Date is faked (vitest's fake timers), so sockets,
// setTimeout, the database and the print worker keep running; the test moves the clock by hand.
// Sessions (lucia), the sign-in rate limiter, invites and print jobs all read Date.now(), so
// expiry is reached by advancing this clock, never by sleeping (a busy machine cannot skew it).
import { afterEach, vi } from 'vitest';

/** A fixed start: 3 Dec 2026 09:00 UTC. */
export const FROZEN_START_MS = Date.UTC(2026, 11, 3, 9, 0, 0);

export interface FrozenDate {
  /** The frozen time, ms since the epoch. */
  now(): number;
  /** Moves the clock forward by `ms`. */
  advance(ms: number): void;
}

/** Freezes Date at `startMs` until the end of the current test. */
export function freezeDate(startMs = FROZEN_START_MS): FrozenDate {
  vi.useFakeTimers({ toFake: ['Date'], now: startMs });
  return {
    now: () => Date.now(),
    advance: (ms) => vi.setSystemTime(Date.now() + ms),
  };
}

// Every file that imports this helper puts the real clock back after each test.
afterEach(() => {
  vi.useRealTimers();
});
