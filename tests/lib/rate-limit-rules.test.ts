// The limits' rules at any instant: a fixed window refuses past its maximum until the window ends;
// a growing rule lets the free tries through, then doubles its wait up to the cap.
import { describe, expect, it } from 'vitest';
import { afterHit, expiresAt, waitMs, type Counter, type Rule } from '@/lib/server/rate-limit-rules';

function hits(rule: Rule, times: number[]): Counter | undefined {
  return times.reduce<Counter | undefined>((c, t) => afterHit(rule, c, t), undefined);
}

describe('fixed window', () => {
  const rule: Rule = { kind: 'fixed', max: 3, windowMs: 1000 };
  it('refuses the fourth hit until the window that began with the first is over', () => {
    const c = hits(rule, [0, 100, 200]);
    expect(waitMs(rule, c, 300)).toBe(700);
    expect(waitMs(rule, c, 1000)).toBe(0);
    expect(afterHit(rule, c, 1000)).toEqual({ count: 1, windowStart: 1000, lastAt: 1000 });
    expect(expiresAt(rule, c!)).toBe(1000);
  });
});

describe('growing wait', () => {
  const rule: Rule = { kind: 'growing', free: 2, baseMs: 10, capMs: 35, quietMs: 100 };
  it('doubles after the free tries, stops at the cap, and forgets after the quiet time', () => {
    expect(waitMs(rule, hits(rule, [0]), 1)).toBe(0);
    expect(waitMs(rule, hits(rule, [0, 1]), 1)).toBe(10);
    expect(waitMs(rule, hits(rule, [0, 1, 11]), 11)).toBe(20);
    expect(waitMs(rule, hits(rule, [0, 1, 11, 31]), 31)).toBe(35);
    expect(waitMs(rule, hits(rule, [0, 1, 11, 31, 66]), 66)).toBe(35);
    expect(waitMs(rule, hits(rule, [0, 1, 11, 31, 66]), 166)).toBe(0);
    expect(afterHit(rule, hits(rule, [0, 1]), 101).count).toBe(1);
  });
});
