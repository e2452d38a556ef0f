// A ticket's notices to the customer: the list with delivery states, and sending the ready notice.
import { route } from '@/lib/server/route';
import { noticeInput } from '@/lib/shared/counter-request';
import { listNotices, resendReadyNotice, sendPayLink, sendReadyNotice } from '@/services/notices';
import { noticeJson } from '@/db/schema/notices';
import { z } from 'zod';

export const prerender = false;

/** Every notice of the ticket with its state, attempts and last error. */
export const GET = route(
  {
    summary: "The ticket's notices with their delivery state, attempts and last error.",
    permission: ['tickets', 'read-all'],
    responses: { 200: z.array(noticeJson) },
  },
  ({ actor, params }) => listNotices(actor, params.id!),
);

/** Sends the ready notice now, or (`again: true`) once more after it has gone; or the open pay link by e-mail or text. */
export const POST = route(
  {
    summary: 'Sends the ready notice now (again: true, once more after it has gone), or the open pay link by e-mail or text.',
    permission: ['notices', 'send'],
    body: noticeInput,
    status: 201,
    examples: [{ summary: 'The ready notice', body: { kind: 'ready' } }],
    responses: { 201: noticeJson },
  },
  ({ actor, params, body }) => {
    const id = params.id!;
    if (body.kind === 'pay-link') return sendPayLink(actor, id, body.channel);
    return body.again ? resendReadyNotice(actor, id) : sendReadyNotice(actor, id);
  },
);
