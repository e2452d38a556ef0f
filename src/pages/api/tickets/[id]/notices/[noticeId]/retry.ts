// Tries a failed notice again now.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { retryNotice } from '@/services/notices';

export const prerender = false;

/** One more delivery attempt; the notice comes back with its new state. */
export const POST: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['notices', 'send']);
  if (actor instanceof Response) return actor;
  return run(() => retryNotice(actor, params.id ?? '', params.noticeId ?? ''));
};
