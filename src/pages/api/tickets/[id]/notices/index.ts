// A ticket's notices to the customer: the list with delivery states, and sending the ready notice.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { noticeInput } from '@/lib/counter-request';
import { listNotices, resendReadyNotice, sendPayLink, sendReadyNotice } from '@/services/notices';

export const prerender = false;

/** Every notice of the ticket with its state, attempts and last error. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['tickets', 'read-all']);
  if (actor instanceof Response) return actor;
  return run(() => listNotices(actor, params.id ?? ''));
};

/** Sends the ready notice now, or (`again: true`) once more after it has gone; or the open pay link by e-mail or text. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['notices', 'send']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, noticeInput);
  if (input instanceof Response) return input;
  const id = params.id ?? '';
  if (input.kind === 'pay-link') return run(() => sendPayLink(actor, id, input.channel), 201);
  return run(() => (input.again ? resendReadyNotice(actor, id) : sendReadyNotice(actor, id)), 201);
};
