// A shop's tickets: the queue, intake and moving a job along its steps.
import { and, desc, eq, isNull, or } from 'drizzle-orm';
import type { z } from 'zod';
import { db } from '@/db';
import { customers, tickets, type Ticket, type TicketStatus, TICKET_STATUSES } from '@/db/schema';
import type { ticketInput } from '@/db/schema/tickets';
import type { Actor } from '@/lib/api';
import { can } from '@/lib/roles';
import { ServiceError } from './errors';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
import { audit } from './audit';

/** The actor's view of the shop's tickets: all of them, or only assigned-to-me and unassigned. */
export async function listTickets(actor: Actor): Promise<Ticket[]> {
  return db.select().from(tickets).where(visibleTo(actor)).orderBy(desc(tickets.createdAt));
}

function visibleTo(actor: Actor) {
  const inShop = eq(tickets.shopId, actor.shopId);
  return can(actor.role, ['tickets', 'read-all'])
    ? inShop
    : and(inShop, or(eq(tickets.assigneeId, actor.userId), isNull(tickets.assigneeId)));
}

/** Opens a ticket at intake; the customer must be one of the shop's. */
export async function createTicket(actor: Actor, input: z.infer<typeof ticketInput>): Promise<Ticket> {
  if (input.customerId) {
    const [c] = await db
      .select({ id: customers.id })
      .from(customers)
      .where(and(eq(customers.id, input.customerId), eq(customers.shopId, actor.shopId)));
    if (!c) throw new ServiceError(422, 'No such customer in this shop.');
  }
  const [row] = await db
    .insert(tickets)
    .values({ ...input, shopId: actor.shopId, createdById: actor.userId })
    .returning();
  await audit(actor.shopId, actor.userId, 'ticket.created', row!.id);
  return row!;
}

/** The one step after this status, or null at the end. */
export function nextStatus(status: TicketStatus): TicketStatus | null {
  return TICKET_STATUSES[TICKET_STATUSES.indexOf(status) + 1] ?? null;
}

/** Moves a ticket one step on: pickup (ready → collected) needs the pickup permission. */
export async function moveTicket(actor: Actor, id: string, to: TicketStatus): Promise<Ticket> {
  if (!UUID.test(id)) throw new ServiceError(404, 'No such ticket in this shop.');
  const [visible] = await db.select().from(tickets).where(and(eq(tickets.id, id), visibleTo(actor)));
  if (!visible) throw new ServiceError(404, 'No such ticket in this shop.');
  if (nextStatus(visible.status) !== to) {
    throw new ServiceError(422, `A ticket at ${visible.status} can only move to ${nextStatus(visible.status) ?? 'nothing'}.`);
  }
  const needs = to === 'collected' ? can(actor.role, ['tickets', 'pickup']) : can(actor.role, ['tickets', 'advance']);
  if (!needs) throw new ServiceError(422, `Your role (${actor.role}) may not move a ticket to ${to}.`);
  const [row] = await db
    .update(tickets)
    .set({ status: to, updatedAt: new Date() })
    .where(and(eq(tickets.id, id), eq(tickets.shopId, actor.shopId), eq(tickets.status, visible.status)))
    .returning();
  if (!row) throw new ServiceError(409, 'Someone else moved this ticket first: reload and try again.');
  await audit(actor.shopId, actor.userId, 'ticket.moved', id, { from: visible.status, to });
  return row;
}

