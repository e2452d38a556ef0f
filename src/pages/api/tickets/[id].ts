// One ticket: move it one step along (bench steps, or pickup at the counter).
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { ticketStatusInput } from '@/db/schema/tickets';
import { moveTicket } from '@/services/tickets';

/** Moves the ticket to its next status. */
export const PATCH: APIRoute = async ({ locals, request, params }) => {
  const input = await readBody(request.clone(), ticketStatusInput);
  const permission = input instanceof Response || input.status !== 'collected' ? 'advance' : 'pickup';
  const actor = guard(locals, ['tickets', permission]);
  if (actor instanceof Response) return actor;
  if (input instanceof Response) return input;
  return run(() => moveTicket(actor, params.id ?? '', input.status));
};
