// A shop's customers: search as you type, one customer's file (tickets, garments, payments,
// notices, history), changes with their history, and erasure on the customer's request.
import { and, asc, desc, eq, inArray, isNull, or, sql } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, customers, files, garments, notices, payments, refunds, sentMail, tickets, type Customer } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { phoneDigits, TEXT_NEEDS_PHONE, type CustomerPatch, type NewCustomer } from '@/lib/shared/customer-request';
import type { CustomerDetails, CustomerFile, CustomerHit } from '@/lib/shared/customer-types';
import { fileStorage } from '@/lib/server/storage';
import { can } from '@/lib/shared/roles';
import { ticketLabel, ticketSearchNumber } from '@/lib/shared/ticket-number';
import { audit, auditOf } from './audit';
import { ServiceError } from './errors';
import { isUuid } from '@/lib/shared/ids';

/** What an erased customer's name becomes. */
export const ERASED_NAME = 'erased';
/** How many customers one search answers with. */
export const SEARCH_LIMIT = 20;

/** Every customer of the actor's shop, by name. */
export async function listCustomers(actor: Actor): Promise<Customer[]> {
  return db.select().from(customers).where(eq(customers.shopId, actor.shopId)).orderBy(asc(customers.name));
}

// LIKE's own wildcards typed in the box are searched as themselves.
const likeEscaped = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * The shop's customers whose name (or a word of it) or e-mail starts with what is typed, whose
 * phone holds the typed digits, or who have the ticket numbered so ("PH 1003", "1003", an old "T-1003"); erased
 * customers are never found. Scoped to the actor's shop in the same WHERE as the match.
 */
export async function searchCustomers(actor: Actor, typed: string): Promise<CustomerHit[]> {
  const q = typed.trim().toLowerCase();
  // Spelled out with an alias: drizzle leaves the table off columns of a one-table select, and
  // "id" inside the subquery would then be the ticket's own.
  const theirTickets = sql`from tickets t where t.customer_id = "customers"."id" and t.shop_id = ${actor.shopId}`;
  const lastTicket = sql<number | null>`(select max(t.number) ${theirTickets})`;
  const base = db.select({ id: customers.id, name: customers.name, phone: customers.phone, email: customers.email, lastTicket }).from(customers);
  const inShop = and(eq(customers.shopId, actor.shopId), isNull(customers.erasedAt));
  const labelled = (rows: Omit<CustomerHit, 'lastTicketLabel'>[]): CustomerHit[] =>
    rows.map((r) => ({ ...r, lastTicketLabel: r.lastTicket === null ? null : ticketLabel(r.lastTicket, actor.shopName) }));
  if (!q) return labelled(await base.where(inShop).orderBy(asc(customers.name)).limit(SEARCH_LIMIT));
  const prefix = `${likeEscaped(q)}%`;
  const digits = phoneDigits(q);
  const ticketNo = ticketSearchNumber(q);
  const ticket = ticketNo !== null && ticketNo.length <= 9 ? [ticketNo, ticketNo] : null;
  const matches = or(
    sql`lower(${customers.name}) like ${prefix}`,
    sql`lower(${customers.name}) like ${`% ${likeEscaped(q)}%`}`,
    sql`lower(${customers.email}) like ${prefix}`,
    // Three digits at least, so a house number in a name search does not find every phone.
    digits.length >= 3 ? sql`${customers.phoneDigits} like ${`%${digits}%`}` : undefined,
    ticket ? sql`exists (select 1 ${theirTickets} and t.number = ${Number(ticket[1])})` : undefined,
  );
  return labelled(await base.where(and(inShop, matches)).orderBy(asc(customers.name)).limit(SEARCH_LIMIT));
}

/** Adds a customer to the actor's shop. */
export async function createCustomer(
  actor: Actor,
  input: NewCustomer | { name: string; phone?: string | null; email?: string | null; notes?: string | null },
): Promise<Customer> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(customers)
      .values({ ...input, shopId: actor.shopId })
      .returning();
    await audit(tx, actor.shopId, actor.userId, 'customer.created', row!.id);
    return row!;
  });
}

/** One customer of the actor's shop; 404 for anyone else's. */
export async function getCustomer(actor: Actor, id: string): Promise<Customer> {
  if (!isUuid(id)) throw new ServiceError(404, 'No such customer in this shop.');
  const [row] = await db
    .select()
    .from(customers)
    .where(and(eq(customers.id, id), eq(customers.shopId, actor.shopId)));
  if (!row) throw new ServiceError(404, 'No such customer in this shop.');
  return row;
}

/** Changes a customer's name, phone, e-mail, notes or contact preference; the old and new values are
 * audited; texts need a phone number (422). */
export async function updateCustomer(actor: Actor, id: string, patch: CustomerPatch): Promise<Customer> {
  const was = await getCustomer(actor, id);
  if (was.erasedAt) throw new ServiceError(409, 'This customer asked to be forgotten: their details cannot be filled in again.');
  const changes: Record<string, { old: unknown; new: unknown }> = {};
  for (const key of ['name', 'phone', 'email', 'notes', 'contactBy'] as const) {
    if (patch[key] !== undefined && patch[key] !== was[key]) changes[key] = { old: was[key], new: patch[key] };
  }
  const contactBy = patch.contactBy ?? was.contactBy;
  const phone = patch.phone !== undefined ? patch.phone : was.phone;
  // Only a change to either is checked: an edit of the notes never trips on an older record.
  if ((changes.contactBy || changes.phone) && contactBy !== 'email' && !phone?.trim()) throw new ServiceError(422, TEXT_NEEDS_PHONE);
  if (Object.keys(changes).length === 0) return was;
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(customers)
      .set(Object.fromEntries(Object.entries(changes).map(([k, v]) => [k, v.new])))
      .where(and(eq(customers.id, id), eq(customers.shopId, actor.shopId), isNull(customers.erasedAt)))
      .returning();
    if (!row) throw new ServiceError(409, 'This customer asked to be forgotten: their details cannot be filled in again.');
    await audit(tx, actor.shopId, actor.userId, 'customer.changed', id, changes);
    return row;
  });
}

function details(c: Customer): CustomerDetails {
  return {
    id: c.id,
    name: c.name,
    phone: c.phone,
    email: c.email,
    notes: c.notes,
    contactBy: c.contactBy,
    erasedAt: c.erasedAt?.toISOString() ?? null,
    createdAt: c.createdAt.toISOString(),
  };
}

/** The customers screen's view of one customer: details, every ticket with its garments, payments
 * and notices (newest ticket first), and the history of changes to the details. */
export async function customerFile(actor: Actor, id: string): Promise<CustomerFile> {
  const c = await getCustomer(actor, id);
  const ts = await db
    .select()
    .from(tickets)
    .where(and(eq(tickets.shopId, actor.shopId), eq(tickets.customerId, c.id)))
    .orderBy(desc(tickets.number));
  const ids = ts.map((t) => t.id);
  const [gs, ps, ns, rs] = ids.length
    ? await Promise.all([
        db
          .select()
          .from(garments)
          .where(and(eq(garments.shopId, actor.shopId), inArray(garments.ticketId, ids)))
          .orderBy(asc(garments.position)),
        db
          .select({
            id: payments.id,
            ticketId: payments.ticketId,
            method: payments.method,
            amountMinor: payments.amountMinor,
            currency: payments.currency,
            at: payments.at,
          })
          .from(payments)
          .where(and(eq(payments.shopId, actor.shopId), inArray(payments.ticketId, ids)))
          .orderBy(asc(payments.at)),
        db
          .select({ id: notices.id, ticketId: notices.ticketId, kind: notices.kind, status: notices.status, sentAt: notices.sentAt })
          .from(notices)
          .where(and(eq(notices.shopId, actor.shopId), inArray(notices.ticketId, ids)))
          .orderBy(asc(notices.createdAt)),
        db
          .select({
            id: refunds.id,
            ticketId: refunds.ticketId,
            method: refunds.method,
            status: refunds.status,
            amountMinor: refunds.amountMinor,
            currency: refunds.currency,
            at: refunds.at,
          })
          .from(refunds)
          .where(and(eq(refunds.shopId, actor.shopId), inArray(refunds.ticketId, ids)))
          .orderBy(asc(refunds.at)),
      ])
    : [[], [], [], []];
  return {
    customer: details(c),
    tickets: ts.map((t) => ({
      id: t.id,
      number: t.number,
      label: ticketLabel(t.number, actor.shopName),
      status: t.status,
      dueOn: t.dueOn,
      createdAt: t.createdAt.toISOString(),
      garments: gs.filter((g) => g.ticketId === t.id).map((g) => ({ id: g.id, description: g.description ?? 'Trousers', status: g.status })),
      payments: ps.filter((p) => p.ticketId === t.id).map(({ ticketId: _, at, ...p }) => ({ ...p, at: at.toISOString() })),
      refunds: rs.filter((r) => r.ticketId === t.id).map(({ ticketId: _, at, ...r }) => ({ ...r, at: at.toISOString() })),
      notices: ns.filter((n) => n.ticketId === t.id).map(({ ticketId: _, sentAt, ...n }) => ({ ...n, sentAt: sentAt?.toISOString() ?? null })),
    })),
    history: await auditOf(actor.shopId, [c.id]),
  };
}

/**
 * Forgets a customer on their request (the lead only): the name becomes "erased", phone, e-mail
 * and notes are cleared, the photos of their garments are deleted from the storage, the addresses
 * and texts of notices sent to them are blanked, and the old values in the history of changes are
 * dropped. Tickets, garments, fittings, price lines and payments stay: the money records are kept.
 */
export async function eraseCustomer(actor: Actor, id: string): Promise<CustomerDetails> {
  if (!can(actor.role, ['customers', 'erase'])) throw new ServiceError(422, `Your role (${actor.role}) may not erase a customer.`);
  const c = await getCustomer(actor, id);
  if (c.erasedAt) return details(c);
  const { row, keys } = await db.transaction(async (tx) => {
    const ticketIds = (
      await tx
        .select({ id: tickets.id })
        .from(tickets)
        .where(and(eq(tickets.shopId, actor.shopId), eq(tickets.customerId, c.id)))
    ).map((t) => t.id);
    const photos = ticketIds.length
      ? await tx
          .delete(files)
          .where(
            and(
              eq(files.shopId, actor.shopId),
              or(
                inArray(files.ticketId, ticketIds),
                inArray(
                  files.garmentId,
                  tx
                    .select({ id: garments.id })
                    .from(garments)
                    .where(and(eq(garments.shopId, actor.shopId), inArray(garments.ticketId, ticketIds))),
                ),
              ),
            ),
          )
          .returning({ path: files.path, thumbPath: files.thumbPath })
      : [];
    if (ticketIds.length) {
      await tx
        .update(notices)
        .set({ to: ERASED_NAME, body: '' })
        .where(and(eq(notices.shopId, actor.shopId), inArray(notices.ticketId, ticketIds)));
    }
    // The shop's own record of mail it sent them (never another shop's rows).
    if (c.email) {
      await tx
        .update(sentMail)
        .set({ to: ERASED_NAME })
        .where(and(eq(sentMail.shopId, actor.shopId), sql`lower(${sentMail.to}) = ${c.email.toLowerCase()}`));
    }
    // The history keeps who changed what and when, not the old values themselves.
    const changed = await tx
      .select({ id: auditEvents.id, detail: auditEvents.detail })
      .from(auditEvents)
      .where(and(eq(auditEvents.shopId, actor.shopId), eq(auditEvents.subject, c.id), eq(auditEvents.action, 'customer.changed')));
    for (const e of changed) {
      await tx
        .update(auditEvents)
        .set({ detail: { fields: Object.keys(e.detail as object), erased: true } })
        .where(eq(auditEvents.id, e.id));
    }
    const [row] = await tx
      .update(customers)
      .set({ name: ERASED_NAME, phone: null, email: null, notes: null, contactBy: 'email', erasedAt: new Date() })
      .where(and(eq(customers.id, c.id), eq(customers.shopId, actor.shopId)))
      .returning();
    await audit(tx, actor.shopId, actor.userId, 'customer.erased', c.id, { tickets: ticketIds.length, photos: photos.length });
    return { row: row!, keys: photos.flatMap((p) => (p.thumbPath ? [p.path, p.thumbPath] : [p.path])) };
  });
  // The rows are gone with the transaction; a file the storage will not remove now is logged (an
  // orphan to sweep), never a reason to answer as if the customer were still there.
  for (const key of keys) {
    try {
      await fileStorage().delete(key);
    } catch (e) {
      console.warn(`Erasing customer ${c.id}: could not remove ${key} from the storage: ${(e as Error).message}`);
    }
  }
  return details(row);
}
