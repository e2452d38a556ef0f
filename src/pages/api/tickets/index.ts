// The shop's tickets: the list as the role sees it, and intake with the garments brought in.
import type { APIRoute } from 'astro';
import { guard, problem, readBody, run } from '@/lib/api';
import { intakeRequest, pricesAtIntake } from '@/lib/bench-requests';
import { can } from '@/lib/roles';
import { createTicket, listTickets } from '@/services/tickets';

/** Tickets visible to the role (an apprentice sees assigned-to-them and unassigned), newest number first. */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => listTickets(actor));
};

/** Opens a ticket: an existing customer or a new one, and its garments, priced at intake when asked (the counter and the lead). */
export const POST: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['tickets', 'create']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, intakeRequest);
  if (input instanceof Response) return input;
  if (input.customer && !can(actor.role, ['customers', 'create'])) return problem(403, `Your role (${actor.role}) may not add customers.`);
  if (pricesAtIntake(input) && !can(actor.role, ['prices', 'adjust'])) return problem(403, `Your role (${actor.role}) may not price work at intake.`);
  return run(() => createTicket(actor, input), 201);
};
