// The queue: open work (every garment not yet collected) by default, the collected history a page
// at a time with view=history (src/lib/queue-request.ts). Each answer carries an ETag; a client
// sending it back in If-None-Match gets 304 while the list is unchanged.
import type { APIRoute } from 'astro';
import { guard, problem, refusal } from '@/lib/api';
import { fieldMessages } from '@/lib/plan-request';
import { queueQuery } from '@/lib/queue-request';
import { queryObject } from '@/lib/sheet-request';
import { readQueue } from '@/services/queue';

/** The garments of the queue the role may see (an apprentice: their own and unassigned). */
export const GET: APIRoute = async ({ locals, url, request }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  const q = queueQuery.safeParse(queryObject(url.searchParams));
  if (!q.success) return problem(400, 'Some of the queue parameters are not understood.', fieldMessages(q.error));
  try {
    const answer = await readQueue(actor, q.data, request.headers.get('if-none-match'));
    // private: the list is one member's; no-cache: a client keeps it but asks again each time.
    const headers = new Headers({ etag: answer.etag, 'cache-control': 'private, no-cache', vary: 'Cookie' });
    if (answer.next) {
      const next = new URLSearchParams({ view: 'history', after: answer.next, limit: String(q.data.limit) });
      headers.set('x-next-cursor', answer.next);
      headers.set('link', `</api/garments?${next}>; rel="next"`);
    }
    if (!answer.rows) return new Response(null, { status: 304, headers });
    headers.set('content-type', 'application/json');
    return new Response(JSON.stringify(answer.rows), { headers });
  } catch (e) {
    return refusal(e);
  }
};
