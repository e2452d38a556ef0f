// Failed sign-ins, limited in the database so every server process counts them (README: Security).
// Three counts per attempt, whatever the body's encoding: the account from this address (a growing
// wait after 5 failures, at most 5 min), the account from anywhere (after 10, a growing wait of at
// most 1 min, so strangers guessing cannot keep the owner out for long) and the address across all
// accounts (30 failures, then 15 min). An attempt is counted before the password is checked, so
// many sent at once cannot slip past the count; it is taken back unless the password was wrong.
import { tooMany } from '@/lib/server/api';
import { requestEmail } from '@/lib/server/request-email';
import type { Rule } from '@/lib/server/rate-limit-rules';
import { clearLimits, hitLimits, limitKey, runCounted, unhitLimits, type Limit } from './rate-limits';

const MINUTE = 60_000;

/** The sign-in rules; the waits grow from base to cap with each further failure. */
export const SIGN_IN_RULES = {
  pair: { kind: 'growing', free: 5, baseMs: 30_000, capMs: 5 * MINUTE, quietMs: 15 * MINUTE },
  account: { kind: 'growing', free: 10, baseMs: 5_000, capMs: MINUTE, quietMs: 15 * MINUTE },
  address: { kind: 'fixed', max: 30, windowMs: 15 * MINUTE },
} satisfies Record<string, Rule>;

/** The limits one sign-in attempt counts against (only the address's when no e-mail was sent). */
export function signInLimits(email: string, address: string): Limit[] {
  const limits: Limit[] = [{ key: limitKey('signin:addr', address), rule: SIGN_IN_RULES.address }];
  if (email) {
    limits.push({ key: limitKey('signin:pair', email, address), rule: SIGN_IN_RULES.pair });
    limits.push({ key: limitKey('signin:acct', email), rule: SIGN_IN_RULES.account });
  }
  return limits;
}

const REFUSED: Record<string, string> = {
  'signin:pair': 'this account from this address',
  'signin:acct': 'this account',
  'signin:addr': 'this address',
};

function minutes(seconds: number): string {
  return seconds < 60 ? `${seconds} s` : `${Math.ceil(seconds / 60)} min`;
}

/** Wraps better-auth's e-mail sign-in with the limits; `address` is the client's (client-address.ts). */
export async function limitedSignIn(request: Request, address: string, handler: (r: Request) => Promise<Response>): Promise<Response> {
  const email = await requestEmail(request);
  const limits = signInLimits(email, address);
  const hit = await hitLimits(limits);
  if (!hit.ok) {
    const kind = hit.key.slice(0, hit.key.lastIndexOf(':'));
    console.warn(`[limits] sign-in refused: too many failures for ${REFUSED[kind] ?? kind} (address ${address}), retry in ${hit.retryAfter} s`);
    return tooMany(`Too many failed sign-ins for ${REFUSED[kind] ?? 'this account'}. Try again in ${minutes(hit.retryAfter)}.`, hit.retryAfter);
  }
  const keys = limits.map((l) => l.key);
  const response = await runCounted(keys, () => handler(request));
  if (response.status === 200) {
    // The right password ends this address's streak on the account; the other counts only lose this attempt.
    const pair = limits.filter((l) => l.key.startsWith('signin:pair:')).map((l) => l.key);
    await clearLimits(pair);
    await unhitLimits(keys.filter((k) => !pair.includes(k)));
  } else if (response.status !== 401) {
    await unhitLimits(keys);
  }
  return response;
}
