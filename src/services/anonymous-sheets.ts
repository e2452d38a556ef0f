// Cut sheets printed without signing in (the public calculator): 30 per 10 minutes per client
// address, counted in the database, and rendered one at a time per process with at most 8
// waiting, each only once no member's request is in flight (member-activity.ts): strangers queue
// behind each other and behind members. The render itself runs in the sheet worker
// (cut-sheet/render-off-thread.ts), so a member's request arriving meanwhile is not held up.
import pLimit from 'p-limit';
import type { Rule } from '@/lib/server/rate-limit-rules';
import { tooMany } from '@/lib/server/api';
import { whenMembersIdle } from '@/lib/server/member-activity';
import { hitLimits, limitKey } from './rate-limits';

/** At most 30 anonymous sheets per 10 minutes from one address. */
export const ANONYMOUS_SHEET_RULE = { kind: 'fixed', max: 30, windowMs: 10 * 60_000 } satisfies Rule;
const MAX_WAITING = 8;
const slot = pLimit(1);

/** The 429 for an anonymous sheet from `address` past its limit, or null when it may print. */
export async function anonymousSheetRefusal(address: string): Promise<Response | null> {
  const hit = await hitLimits([{ key: limitKey('sheet:addr', address), rule: ANONYMOUS_SHEET_RULE }]);
  if (hit.ok) return null;
  console.warn(`[limits] anonymous cut sheet refused (address ${address}), retry in ${hit.retryAfter} s`);
  return tooMany(
    `Too many cut sheets from this address without signing in. Sign in to print more, or try again in ${Math.ceil(hit.retryAfter / 60)} min.`,
    hit.retryAfter,
  );
}

/** Runs an anonymous render in the per-process queue; undefined when the queue is full. */
export function inAnonymousQueue<T>(work: () => Promise<T>): Promise<T> | undefined {
  if (slot.activeCount + slot.pendingCount > MAX_WAITING) return undefined;
  return slot(async () => {
    await whenMembersIdle();
    return work();
  });
}
