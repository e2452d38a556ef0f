// The shop's tickets: the queue as the role sees it, and intake.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { ticketInput } from '@/db/schema/tickets';
import { createTicket, listTickets } from '@/services/tickets';

/** Tickets visible to the role (an apprentice sees assigned-to-them and unassigned). */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => listTickets(actor));
};

/** Opens a ticket at intake. */
export const POST: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['tickets', 'create']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, ticketInput);
  if (input instanceof Response) return input;
  return run(() => createTicket(actor, input), 201);
};
