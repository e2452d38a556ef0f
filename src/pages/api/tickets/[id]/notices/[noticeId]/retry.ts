// Tries a failed notice again now.
import { route } from '@/lib/server/route';
import { retryNotice } from '@/services/notices';
import { noticeJson } from '@/db/schema/notices';

export const prerender = false;

/** One more delivery attempt; the notice comes back with its new state. */
export const POST = route(
  {
    summary: 'Tries a failed notice again now (409 for one that went); answers the notice with its new state.',
    permission: ['notices', 'send'],
    responses: { 200: noticeJson },
  },
  ({ actor, params }) => retryNotice(actor, params.id!, params.noticeId!),
);
