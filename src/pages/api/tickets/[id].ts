// One ticket: read it with its customer and garments, or move it (all its garments at its step) on.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { ticketStatusInput } from '@/db/schema/tickets';
import { getTicket, moveTicket } from '@/services/tickets';

/** The ticket with its customer and the garments the role may see. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => getTicket(actor, params.id ?? ''));
};

/** Moves the ticket to its next step. */
export const PATCH: APIRoute = async ({ locals, request, params }) => {
  const input = await readBody(request.clone(), ticketStatusInput);
  const permission = input instanceof Response || input.status !== 'collected' ? 'advance' : 'pickup';
  const actor = guard(locals, ['tickets', permission]);
  if (actor instanceof Response) return actor;
  if (input instanceof Response) return input;
  return run(() => moveTicket(actor, params.id ?? '', input.status));
};
