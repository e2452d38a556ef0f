// The queue: open work (every garment not yet collected) by default, the collected history a page
// at a time with view=history (src/lib/shared/queue-request.ts). Each answer carries an ETag; a client
// sending it back in If-None-Match gets 304 while the list is unchanged.
import { route } from '@/lib/server/route';
import { queueQuery } from '@/lib/shared/queue-request';
import { readQueue } from '@/services/queue';
import { queueRowJson } from '@/lib/server/answers/bench';
import { z } from 'zod';

/** The garments of the queue the role may see (an apprentice: their own and unassigned). */
export const GET = route(
  {
    summary: 'The queue: open garments, or with view=history the collected ones a page at a time (Link rel="next").',
    description:
      'Each answer carries an ETag; sent back in If-None-Match, the answer is 304 while the list is unchanged. An apprentice sees their own garments and unassigned ones.',
    permission: ['tickets', 'read'],
    query: queueQuery,
    examples: [{ summary: 'Open work' }, { summary: 'The latest 20 collected', query: { view: 'history', limit: '20' } }],
    responses: { 200: z.array(queueRowJson) },
  },
  async ({ actor, query, request }) => {
    const answer = await readQueue(actor, query, request.headers.get('if-none-match'));
    // private: the list is one member's; no-cache: a client keeps it but asks again each time.
    const headers = new Headers({ etag: answer.etag, 'cache-control': 'private, no-cache', vary: 'Cookie' });
    if (answer.next) {
      const next = new URLSearchParams({ view: 'history', after: answer.next, limit: String(query.limit) });
      headers.set('x-next-cursor', answer.next);
      headers.set('link', `</api/garments?${next}>; rel="next"`);
    }
    if (answer.body == null) return new Response(null, { status: 304, headers });
    headers.set('content-type', 'application/json');
    // The JSON kept with the answer (services/queue.ts): not serialised again per request.
    return new Response(answer.body, { headers });
  },
);
