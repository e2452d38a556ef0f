// A shop's tickets: intake (with its garments), one ticket's page, and moving a whole ticket on.
import { and, asc, desc, eq, exists, isNull, or, sql } from 'drizzle-orm';
import { db } from '@/db';
import { customers, garments, tickets, type Ticket } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { intakeRequest, type IntakeInput } from '@/lib/shared/bench-requests';
import type { TicketDetail } from '@/lib/shared/bench-types';
import { nextStep, stepLabel, type GarmentStep } from '@/lib/shared/garment-steps';
import { can } from '@/lib/shared/roles';
import { audit } from './audit';
import { ServiceError } from './errors';
import { moveGarmentsLocked, tellMoved } from './garment-moves';
import { customerCard, garmentVisibleTo, isUuid, refreshTicketAssignee, staffOf, summaries, withTicketLock } from './garments';
import { pickUp } from './counter/hand-over';
import { priceAtIntake } from './counter/intake-prices';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { copyFittings } from './fitting-copy';

/** A ticket as listed: the row plus who it is for and how many garments it holds. */
export type TicketListItem = Ticket & { customerName: string | null; garmentCount: number };

// Without read-all (the apprentice): the tickets given to them or to nobody yet, and those holding a
// garment they see in the queue (theirs or nobody's), so each queue row's ticket opens for them.
function visibleTo(actor: Actor) {
  const inShop = eq(tickets.shopId, actor.shopId);
  if (can(actor.role, ['tickets', 'read-all'])) return inShop;
  const holdsVisibleWork = exists(
    db
      .select({ one: sql`1` })
      .from(garments)
      .where(and(eq(garments.ticketId, tickets.id), garmentVisibleTo(actor))),
  );
  return and(inShop, or(eq(tickets.assigneeId, actor.userId), isNull(tickets.assigneeId), holdsVisibleWork));
}

/** The actor's view of the shop's tickets: all of them, or only assigned-to-me and unassigned. */
export async function listTickets(actor: Actor): Promise<TicketListItem[]> {
  const rows = await db
    .select({
      t: tickets,
      customerName: customers.name,
      garmentCount: sql<number>`(select count(*)::int from ${garments} where ${garments.ticketId} = ${tickets.id})`,
    })
    .from(tickets)
    .leftJoin(customers, eq(customers.id, tickets.customerId))
    .where(visibleTo(actor))
    .orderBy(desc(tickets.number));
  return rows.map((r) => ({ ...r.t, customerName: r.customerName, garmentCount: r.garmentCount }));
}

/** One ticket with its customer and the garments the actor may see. */
export async function getTicket(actor: Actor, id: string): Promise<TicketDetail> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such ticket in this shop.');
  const [t] = await db
    .select()
    .from(tickets)
    .where(and(eq(tickets.id, id), visibleTo(actor)));
  if (!t) throw new ServiceError(404, 'No such ticket in this shop.');
  const [c] = t.customerId ? await db.select().from(customers).where(eq(customers.id, t.customerId)) : [];
  const rows = await db
    .select()
    .from(garments)
    .where(and(eq(garments.ticketId, id), garmentVisibleTo(actor)))
    .orderBy(asc(garments.position));
  return {
    id: t.id,
    number: t.number,
    status: t.status,
    note: t.note,
    dueOn: t.dueOn,
    createdAt: t.createdAt.toISOString(),
    customer: c ? customerCard(actor, c) : null,
    garments: await summaries(rows),
  };
}

/** Opens a ticket with the next number of the shop, its customer (existing or new) and its garments. */
export async function createTicket(actor: Actor, typed: IntakeInput): Promise<Ticket> {
  const input = intakeRequest.parse(typed);
  if (input.customerId) {
    const [c] = await db
      .select({ id: customers.id })
      .from(customers)
      .where(and(eq(customers.id, input.customerId), eq(customers.shopId, actor.shopId)));
    if (!c) throw new ServiceError(422, 'No such customer in this shop.');
  }
  if (input.rush && input.garments.length === 0) throw new ServiceError(422, 'Rush goes on a ticket with work priced on it: add a garment and its work first.');
  const people = new Set((await staffOf(actor)).map((p) => p.userId));
  if (input.garments.some((g) => g.assigneeId && !people.has(g.assigneeId))) throw new ServiceError(422, 'Give each garment to someone in this shop.');
  const row = await db.transaction(async (tx) => {
    // One number at a time per shop, also when several counters take work in at once.
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${actor.shopId}))`);
    const [last] = await tx
      .select({ n: sql<number | null>`max(${tickets.number})` })
      .from(tickets)
      .where(eq(tickets.shopId, actor.shopId));
    let customerId = input.customerId;
    if (!customerId && input.customer) {
      const [c] = await tx
        .insert(customers)
        .values({ ...input.customer, shopId: actor.shopId })
        .returning({ id: customers.id });
      customerId = c!.id;
    }
    const [t] = await tx
      .insert(tickets)
      .values({ shopId: actor.shopId, number: (last?.n ?? 1000) + 1, customerId, note: input.note, dueOn: input.dueOn, createdById: actor.userId })
      .returning();
    if (input.garments.length) {
      const made = await tx
        .insert(garments)
        .values(
          // The finish asked for at intake is kept on the garment: the fitting's own finish wins over it.
          input.garments.map((g, position) => ({
            shopId: actor.shopId,
            ticketId: t!.id,
            position,
            description: g.description,
            kind: g.kind ?? 'trousers',
            dueOn: g.dueOn ?? input.dueOn,
            assigneeId: g.assigneeId,
            existingFinish: g.existingFinish,
            finish: g.finish,
          })),
        )
        .returning({ id: garments.id, position: garments.position, existingFinish: garments.existingFinish, kind: garments.kind });
      // "Same as last time": only an existing customer has a last time.
      const copies = input.garments.flatMap((g, i) => (g.fittingFrom ? [{ to: made.find((m) => m.position === i)!.id, from: g.fittingFrom }] : []));
      await copyFittings(tx, actor, input.customerId, copies);
      // Priced at intake when asked (a finish, kinds of work, rush), in the same transaction.
      const taken = input.garments.map((g, i) => {
        const m = made.find((x) => x.position === i)!;
        return { id: m.id, label: g.description, kind: m.kind, finish: g.finish, existingFinish: m.existingFinish, work: g.work };
      });
      await priceAtIntake(tx, actor, t!.id, taken, input.rush);
      // Work given to someone at intake gives them the ticket.
      return { ...t!, assigneeId: await refreshTicketAssignee(tx, actor.shopId, t!.id) };
    }
    await audit(tx, actor.shopId, actor.userId, 'ticket.created', t!.id, { number: t!.number, garments: input.garments.length });
    return t!;
  });
  return row;
}

/** Moves every garment standing at the ticket's step on to the next one, all in one transaction
 * or none; to "collected" it is the counter's pickup (ready, nothing due, the pickup permission). */
export async function moveTicket(actor: Actor, id: string, to: GarmentStep): Promise<Ticket> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such ticket in this shop.');
  const [visible] = await db
    .select()
    .from(tickets)
    .where(and(eq(tickets.id, id), visibleTo(actor)));
  if (!visible) throw new ServiceError(404, 'No such ticket in this shop.');
  assertNextStep(visible, to, actor.shopName);
  const allowed = to === 'collected' ? can(actor.role, ['tickets', 'pickup']) : can(actor.role, ['tickets', 'advance']);
  if (!allowed) throw new ServiceError(422, `Your role (${actor.role}) may not move a ticket to ${stepLabel(to)}.`);
  if (to === 'collected') {
    await pickUp(actor, id);
  } else {
    const moved = await withTicketLock(actor.shopId, id, async (tx, ticket) => {
      // Checked again under the lock: someone may have moved the ticket since it was read.
      assertNextStep(ticket, to, actor.shopName);
      const behind = await tx
        .select()
        .from(garments)
        .where(and(eq(garments.shopId, actor.shopId), eq(garments.ticketId, id), eq(garments.status, ticket.status)));
      if (!can(actor.role, ['tickets', 'read-all']) && behind.some((g) => g.assigneeId && g.assigneeId !== actor.userId)) {
        throw new ServiceError(422, `Some garments of ${ticketLabel(ticket.number, actor.shopName)} are someone else's: move yours one by one.`);
      }
      if (behind.length === 0) throw new ServiceError(422, `Ticket ${ticketLabel(ticket.number, actor.shopName)} has no garments yet: add one first.`);
      const rows = await moveGarmentsLocked(
        tx,
        actor,
        id,
        behind.map((g) => g.id),
        ticket.status,
        to,
      );
      return { from: ticket.status, rows };
    });
    await tellMoved(actor, moved.rows);
  }
  const [row] = await db.select().from(tickets).where(eq(tickets.id, id));
  return row!;
}

function assertNextStep(ticket: Ticket, to: GarmentStep, shopName: string): void {
  const next = nextStep(ticket.status);
  if (next !== to) {
    throw new ServiceError(
      422,
      next
        ? `Ticket ${ticketLabel(ticket.number, shopName)} is ${stepLabel(ticket.status)}: it can only move on to ${stepLabel(next)}.`
        : `Ticket ${ticketLabel(ticket.number, shopName)} has been collected.`,
    );
  }
}
