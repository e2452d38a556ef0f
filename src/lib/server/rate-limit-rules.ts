// How a limit decides, kept pure so it can be checked at any instant: a counter in, the wait out.
// The counters themselves live in the database (src/services/rate-limits.ts).

/**
 * A limit on one key: `fixed` allows `max` hits per window counted from the window's first hit;
 * `growing` lets `free` hits through, then each further one must wait base·2^(n−free) (at most
 * `capMs`) after the last, and the count is forgotten after `quietMs` without a hit.
 */
export type Rule = { kind: 'fixed'; max: number; windowMs: number } | { kind: 'growing'; free: number; baseMs: number; capMs: number; quietMs: number };

/** A key's counter: hits so far, when its window began and when the last hit came (ms). */
export interface Counter {
  count: number;
  windowStart: number;
  lastAt: number;
}

function live(rule: Rule, c: Counter | undefined, now: number): c is Counter {
  if (!c) return false;
  return rule.kind === 'fixed' ? now < c.windowStart + rule.windowMs : now < c.lastAt + rule.quietMs;
}

/** Milliseconds a hit must still wait at `now`; 0 when it may go ahead. */
export function waitMs(rule: Rule, c: Counter | undefined, now: number): number {
  if (!live(rule, c, now)) return 0;
  if (rule.kind === 'fixed') return c.count >= rule.max ? c.windowStart + rule.windowMs - now : 0;
  if (c.count < rule.free) return 0;
  const delay = Math.min(rule.baseMs * 2 ** (c.count - rule.free), rule.capMs);
  return Math.max(0, c.lastAt + delay - now);
}

/** The counter after one more hit at `now`. */
export function afterHit(rule: Rule, c: Counter | undefined, now: number): Counter {
  if (!live(rule, c, now)) return { count: 1, windowStart: now, lastAt: now };
  return { count: c.count + 1, windowStart: c.windowStart, lastAt: now };
}

/** When the counter stops mattering and may be deleted (ms). */
export function expiresAt(rule: Rule, c: Counter): number {
  return rule.kind === 'fixed' ? c.windowStart + rule.windowMs : c.lastAt + Math.max(rule.quietMs, rule.capMs);
}
