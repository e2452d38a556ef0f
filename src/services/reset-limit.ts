// Password-reset mail, limited in the database (README: Security): at most 3 requests an hour for one
// e-mail address, whoever asks, and 10 an hour from one client address. The same count whether the
// account exists or not, so a refusal tells nothing about who has an account.
import { requestEmail } from '@/lib/server/request-email';
import type { Rule } from '@/lib/server/rate-limit-rules';
import { tooMany } from '@/lib/server/api';
import { hitLimits, limitKey, runCounted, unhitLimits, type Limit } from './rate-limits';

const HOUR = 3_600_000;

/** The reset-mail rules. */
export const RESET_RULES = {
  email: { kind: 'fixed', max: 3, windowMs: HOUR },
  address: { kind: 'fixed', max: 10, windowMs: HOUR },
} satisfies Record<string, Rule>;

/** Wraps better-auth's request-password-reset with the limits; `address` is the client's. */
export async function limitedResetRequest(request: Request, address: string, handler: (r: Request) => Promise<Response>): Promise<Response> {
  const email = await requestEmail(request);
  const limits: Limit[] = [{ key: limitKey('reset:addr', address), rule: RESET_RULES.address }];
  if (email) limits.push({ key: limitKey('reset:email', email), rule: RESET_RULES.email });
  const hit = await hitLimits(limits);
  if (!hit.ok) {
    const perEmail = hit.key.startsWith('reset:email:');
    console.warn(
      `[limits] password reset refused: too many for ${perEmail ? 'one e-mail address' : 'this address'} (address ${address}), retry in ${hit.retryAfter} s`,
    );
    return tooMany(
      `Too many password-reset requests ${perEmail ? 'for this e-mail address' : 'from this address'}. Try again in ${Math.ceil(hit.retryAfter / 60)} min.`,
      hit.retryAfter,
    );
  }
  const keys = limits.map((l) => l.key);
  const response = await runCounted(keys, () => handler(request));
  // A refused body (bad address, 400) sent no mail; only the requests better-auth took count.
  if (response.status !== 200) await unhitLimits(keys);
  return response;
}
