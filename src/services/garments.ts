// Garments on the bench: the queue, one garment's page, adding and editing them, and moving one
// step along. A ticket's status follows its least advanced garment.
import type { ContactPreference } from '@/lib/shared/contact-channels';
import { and, asc, eq, inArray, isNotNull, isNull, or } from 'drizzle-orm';
import type { z } from 'zod';
import { db, type Db } from '@/db';
import { customers, garments, member, tickets, user, type Garment } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { garmentInput, garmentPatch } from '@/lib/shared/bench-requests';
import type { CustomerCard, GarmentDetail, Person, QueueRow, TicketGarment } from '@/lib/shared/bench-types';
import { nextStep, stepLabel, type GarmentStep } from '@/lib/shared/garment-steps';
import { can } from '@/lib/shared/roles';
import { audit } from './audit';
import { ServiceError } from './errors';
import { kindOf } from '@/lib/shared/fitting/garment-kinds';
import { assertReadyToHandOver } from './counter/hand-over';
import { moveGarmentsLocked, tellMoved, writeTicketStatus } from './garment-moves';
import { isUuid, lockTicket, withTicketLock } from './ticket-core';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { copyFittings } from './fitting-copy';
import { fittedGarments } from './fitting-rule';

// The ticket core, here too for the services that already import it from here.
export { isUuid, lockTicket, withTicketLock };

/** Garments the actor may see: all of the shop's, or (apprentice) their own and unassigned. */
export function garmentVisibleTo(actor: Actor) {
  const inShop = eq(garments.shopId, actor.shopId);
  return can(actor.role, ['tickets', 'read-all']) ? inShop : and(inShop, or(eq(garments.assigneeId, actor.userId), isNull(garments.assigneeId)));
}

/** The customer as a ticket or garment shows them: contact details (e-mail, phone, notes) only to
 * roles that may read customers; an apprentice works the garment, never calls its owner. */
export function customerCard(
  actor: Pick<Actor, 'role'>,
  c: { id: string; name: string; phone: string | null; email: string | null; notes: string | null; contactBy?: ContactPreference },
): CustomerCard {
  if (!can(actor.role, ['customers', 'read'])) return { id: c.id, name: c.name };
  return { id: c.id, name: c.name, phone: c.phone, email: c.email, notes: c.notes, contactBy: c.contactBy ?? 'email' };
}

/** Sets a ticket's assignee to the person its first garment given to someone is given to (null
 * when none is), so the ticket follows the work: call after garments are added or reassigned. */
export async function refreshTicketAssignee(tx: Db, shopId: string, ticketId: string): Promise<string | null> {
  const [first] = await tx
    .select({ assigneeId: garments.assigneeId })
    .from(garments)
    .where(and(eq(garments.shopId, shopId), eq(garments.ticketId, ticketId), isNotNull(garments.assigneeId)))
    .orderBy(asc(garments.position), asc(garments.createdAt))
    .limit(1);
  const assigneeId = first?.assigneeId ?? null;
  await tx
    .update(tickets)
    .set({ assigneeId })
    .where(and(eq(tickets.id, ticketId), eq(tickets.shopId, shopId)));
  return assigneeId;
}

/** Every garment of a ticket of the shop, in the order they were taken in. */
export async function garmentsOfTicket(shopId: string, ticketId: string): Promise<Garment[]> {
  if (!isUuid(ticketId)) return [];
  return db
    .select()
    .from(garments)
    .where(and(eq(garments.shopId, shopId), eq(garments.ticketId, ticketId)))
    .orderBy(asc(garments.position), asc(garments.createdAt));
}

/** The people of the actor's shop who can be given work, by name. */
export async function staffOf(actor: Actor): Promise<Person[]> {
  return db
    .select({ userId: user.id, name: user.name, role: member.role })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(eq(member.organizationId, actor.shopId))
    .orderBy(asc(user.name));
}

async function checkAssignee(actor: Actor, assigneeId: string | null | undefined): Promise<void> {
  if (!assigneeId) return;
  const [m] = await db
    .select({ id: member.id })
    .from(member)
    .where(and(eq(member.organizationId, actor.shopId), eq(member.userId, assigneeId)));
  if (!m) throw new ServiceError(422, 'Give the garment to someone in this shop.');
}

/** The queue: every garment the actor may see with its ticket number, customer and assignee. */
export async function listQueue(actor: Actor): Promise<QueueRow[]> {
  const rows = await db
    .select({
      id: garments.id,
      description: garments.description,
      kind: garments.kind,
      status: garments.status,
      dueOn: garments.dueOn,
      assigneeId: garments.assigneeId,
      assigneeName: user.name,
      ticketId: garments.ticketId,
      ticketNumber: tickets.number,
      customerName: customers.name,
      customerPhone: customers.phone,
    })
    .from(garments)
    .innerJoin(tickets, eq(tickets.id, garments.ticketId))
    .leftJoin(customers, eq(customers.id, tickets.customerId))
    .leftJoin(user, eq(user.id, garments.assigneeId))
    .where(garmentVisibleTo(actor))
    .orderBy(asc(garments.dueOn), asc(tickets.number), asc(garments.position));
  // An apprentice works the garment, never calls its owner (as customerCard): no phone for them.
  const phones = can(actor.role, ['customers', 'read']);
  return rows.map(({ customerPhone, ...r }) => ({
    ...r,
    kind: kindOf(r.kind),
    description: r.description ?? 'Trousers',
    ...(phones ? { customerPhone } : {}),
  }));
}

/** The garment when the actor may see it, otherwise 404. */
export async function visibleGarment(actor: Actor, id: string): Promise<Garment> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such garment in this shop.');
  const [g] = await db
    .select()
    .from(garments)
    .where(and(eq(garments.id, id), garmentVisibleTo(actor)));
  if (!g) throw new ServiceError(404, 'No such garment in this shop.');
  return g;
}

/** Locks a garment of the shop until the transaction ends and returns it; 404 for another shop's garment or an id that is not one.
 * Two saves of one garment's fitting take it first, so the later reads what the earlier wrote. */
export async function lockGarment(tx: Db, shopId: string, id: string): Promise<Garment> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such garment in this shop.');
  const [g] = await tx
    .select()
    .from(garments)
    .where(and(eq(garments.id, id), eq(garments.shopId, shopId)))
    .for('update');
  if (!g) throw new ServiceError(404, 'No such garment in this shop.');
  return g;
}

/** Summaries of garments with their assignees' names and whether each has a fitting saved. */
export async function summaries(rows: Garment[]): Promise<TicketGarment[]> {
  const ids = [...new Set(rows.flatMap((g) => (g.assigneeId ? [g.assigneeId] : [])))];
  const people = ids.length ? await db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, ids)) : [];
  const names = new Map(people.map((u) => [u.id, u.name]));
  const fitted = await fittedGarments(
    db,
    rows.map((g) => g.id),
  );
  return rows.map((g) => ({
    id: g.id,
    description: g.description ?? 'Trousers',
    kind: kindOf(g.kind),
    status: g.status,
    dueOn: g.dueOn,
    assigneeId: g.assigneeId,
    assigneeName: g.assigneeId ? names.get(g.assigneeId) || null : null,
    fitted: fitted.has(g.id),
  }));
}

/** One garment with its ticket and customer. */
export async function getGarment(actor: Actor, id: string): Promise<GarmentDetail> {
  const g = await visibleGarment(actor, id);
  const [t] = await db.select().from(tickets).where(eq(tickets.id, g.ticketId));
  const [c] = t?.customerId ? await db.select().from(customers).where(eq(customers.id, t.customerId)) : [];
  const [summary] = await summaries([g]);
  return {
    ...summary!,
    existingFinish: g.existingFinish,
    ticket: { id: t!.id, number: t!.number, status: t!.status, note: t!.note },
    customer: c ? customerCard(actor, c) : null,
  };
}

/** Sets the ticket's status to its least advanced garment's step; inside a transaction that
 * already holds the ticket's lock, pass it as `tx`. */
export async function refreshTicketStatus(shopId: string, ticketId: string, tx?: Db): Promise<GarmentStep> {
  if (tx) return writeTicketStatus(tx, shopId, ticketId);
  // Two garments of one ticket moved at once: the ticket row is locked before its garments are
  // read, so the later of the two writes from a read that sees both moves.
  return withTicketLock(shopId, ticketId, (locked) => writeTicketStatus(locked, shopId, ticketId));
}

/** Adds a garment to a ticket of the shop. */
export async function addGarment(
  actor: Actor,
  ticketId: string,
  input: Omit<z.output<typeof garmentInput>, 'fittingFrom'> & { fittingFrom?: string | null },
): Promise<Garment> {
  if (!isUuid(ticketId)) throw new ServiceError(404, 'No such ticket in this shop.');
  const [t] = await db
    .select()
    .from(tickets)
    .where(and(eq(tickets.id, ticketId), eq(tickets.shopId, actor.shopId)));
  if (!t) throw new ServiceError(404, 'No such ticket in this shop.');
  if (t.status === 'collected') throw new ServiceError(422, `Ticket ${ticketLabel(t.number, actor.shopName)} is collected: open a new ticket.`);
  await checkAssignee(actor, input.assigneeId);
  const position = (await garmentsOfTicket(actor.shopId, ticketId)).length;
  return withTicketLock(actor.shopId, ticketId, async (tx) => {
    const [row] = await tx
      .insert(garments)
      .values({
        shopId: actor.shopId,
        ticketId,
        description: input.description,
        kind: input.kind ?? 'trousers',
        dueOn: input.dueOn ?? t.dueOn,
        assigneeId: input.assigneeId,
        existingFinish: input.existingFinish,
        position,
      })
      .returning();
    await audit(tx, actor.shopId, actor.userId, 'garment.added', row!.id, { ticket: t.number, description: input.description });
    if (input.fittingFrom) await copyFittings(tx, actor, t.customerId, [{ to: row!.id, from: input.fittingFrom }]);
    await refreshTicketStatus(actor.shopId, ticketId, tx);
    if (input.assigneeId) await refreshTicketAssignee(tx, actor.shopId, ticketId);
    return row!;
  });
}

/** Changes a garment's description, due date, assignee or existing finish; each change is kept in the history. */
export async function updateGarment(actor: Actor, id: string, patch: z.output<typeof garmentPatch>): Promise<Garment> {
  const g = await visibleGarment(actor, id);
  await checkAssignee(actor, patch.assigneeId);
  const changes: Record<string, { old: unknown; new: unknown }> = {};
  for (const key of ['description', 'dueOn', 'assigneeId', 'existingFinish'] as const) {
    if (key in patch && patch[key] !== undefined && patch[key] !== g[key]) changes[key] = { old: g[key], new: patch[key] };
  }
  if (Object.keys(changes).length === 0) return g;
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(garments)
      .set({ ...Object.fromEntries(Object.entries(changes).map(([k, v]) => [k, v.new])), updatedAt: new Date() })
      .where(and(eq(garments.id, id), eq(garments.shopId, actor.shopId)))
      .returning();
    await audit(tx, actor.shopId, actor.userId, 'garment.changed', id, changes);
    if ('assigneeId' in changes) await refreshTicketAssignee(tx, actor.shopId, g.ticketId);
    return row!;
  });
}

/** Moves a garment one step on; pickup (ready → collected) needs the pickup permission. */
export async function moveGarment(actor: Actor, id: string, to: GarmentStep): Promise<Garment> {
  const g = await visibleGarment(actor, id);
  const next = nextStep(g.status);
  if (next !== to) {
    throw new ServiceError(
      422,
      next
        ? `This garment is ${stepLabel(g.status)}: it can only move on to ${stepLabel(next)}.`
        : 'This garment has been collected: there is no step after that.',
    );
  }
  const allowed = to === 'collected' ? can(actor.role, ['tickets', 'pickup']) : can(actor.role, ['tickets', 'advance']);
  if (!allowed) throw new ServiceError(422, `Your role (${actor.role}) may not move a garment to ${stepLabel(to)}.`);
  return writeStep(actor, g, to, false);
}

/**
 * Writes a garment's new step under its ticket's lock (like pickup and the counter's writes: a
 * price line added meanwhile waits, or is already in the balance checked here), refreshes the
 * ticket's status, records the move and tells the listeners. `back` marks a step back.
 */
export async function writeStep(actor: Actor, g: Garment, to: GarmentStep, back: boolean): Promise<Garment> {
  const row = await withTicketLock(actor.shopId, g.ticketId, async (tx, ticket) => {
    if (to === 'collected') {
      // The counter's rule for every way to "collected": the ticket is ready and nothing is left to pay.
      await assertReadyToHandOver(tx, ticket);
    }
    const [moved] = await moveGarmentsLocked(tx, actor, g.ticketId, [g.id], g.status, to, back);
    return moved!;
  });
  await tellMoved(actor, [row]);
  return row;
}
