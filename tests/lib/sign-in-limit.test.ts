// The failed sign-in limit: five failures in fifteen minutes lock the account until they age out.
import { describe, expect, it } from 'vitest';
import { recordSignIn, signInBlockedFor } from '@/lib/sign-in-limit';

describe('sign-in limit', () => {
  it('blocks after the fifth failure and frees the account once the oldest failure is 15 min old', () => {
    const t0 = 1_000_000;
    for (let i = 0; i < 4; i += 1) recordSignIn('x@example.com', false, t0 + i * 1000);
    expect(signInBlockedFor('x@example.com', t0 + 5000)).toBe(0);
    recordSignIn('X@Example.com', false, t0 + 5000);
    expect(signInBlockedFor('x@example.com', t0 + 6000)).toBe(15 * 60 - 6);
    expect(signInBlockedFor('x@example.com', t0 + 15 * 60 * 1000 + 1)).toBe(0);
  });

  it('forgets the failures after a success', () => {
    for (let i = 0; i < 4; i += 1) recordSignIn('y@example.com', false, 2_000_000 + i);
    recordSignIn('y@example.com', true, 2_000_010);
    recordSignIn('y@example.com', false, 2_000_020);
    expect(signInBlockedFor('y@example.com', 2_000_030)).toBe(0);
  });
});
