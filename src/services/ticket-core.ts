// The ticket core every area builds on: the id check, the shop's ticket, and the ticket's row lock.
// It imports no other service, so the bench (garments, tickets) and the counter (services/counter/)
// both sit on it without importing each other in a circle.
import { and, eq } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { tickets, type Ticket } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { isUuid } from '@/lib/shared/ids';
import { ServiceError } from './errors';

export { isUuid };

/** The refusal for a ticket that is not the shop's (or an id that is not one): always 404. */
export function noSuchTicket(): ServiceError {
  return new ServiceError(404, 'No such ticket in this shop.');
}

/** A ticket of the actor's shop; 404 for another shop's ticket or an id that is not one. */
export async function shopTicket(actor: Pick<Actor, 'shopId'>, ticketId: string): Promise<Ticket> {
  if (!isUuid(ticketId)) throw noSuchTicket();
  const [row] = await db
    .select()
    .from(tickets)
    .where(and(eq(tickets.id, ticketId), eq(tickets.shopId, actor.shopId)));
  if (!row) throw noSuchTicket();
  return row;
}

/** Locks a ticket of the shop until the transaction ends and returns it; 404 when there is none. */
export async function lockTicket(tx: Db, shopId: string, ticketId: string): Promise<Ticket> {
  if (!isUuid(ticketId)) throw noSuchTicket();
  const [row] = await tx
    .select()
    .from(tickets)
    .where(and(eq(tickets.id, ticketId), eq(tickets.shopId, shopId)))
    .for('update');
  if (!row) throw noSuchTicket();
  return row;
}

/** Runs work in one transaction holding the ticket's row lock: every write to its status, price
 * lines, payments, refunds and links goes through here, so each one sees the others' finished work.
 * Inside, query only through `tx` (PGlite has one connection: `db` would wait for this transaction). */
export function withTicketLock<T>(shopId: string, ticketId: string, work: (tx: Db, ticket: Ticket) => Promise<T>): Promise<T> {
  return db.transaction(async (tx) => work(tx, await lockTicket(tx, shopId, ticketId)));
}
