// The queue as the API reads it: open work (not yet collected) by default, the collected history
// a page at a time (newest taken in first, by cursor), each answer with an ETag so an unchanged
// list costs a 304. The open list's ETag comes from one aggregate over the same rows (no rows
// leave the database for it); every ETag also holds who asks, so it never matches across shops,
// people or roles.
import { createHash } from 'node:crypto';
import { and, sql, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import { garments } from '@/db/schema';
import type { Actor } from '@/lib/api';
import type { QueueRow, WhoOption } from '@/lib/bench-types';
import { whoOptions } from '@/lib/queue-filter';
import { encodeCursor, type QueueCursor } from '@/lib/queue-request';
import { can } from '@/lib/roles';
import { garmentVisibleTo, staffOf } from './garments';

/** What the queue API is asked: open work, or a page of history after a cursor. */
export interface QueueQuery {
  view: 'open' | 'history';
  /** the cursor of the last row of the page before (history only) */
  after?: QueueCursor;
  /** rows per history page */
  limit: number;
}

/** An answer: the rows (null when the client's ETag still holds), the ETag, and the next page's cursor. */
export interface QueueAnswer {
  etag: string;
  rows: QueueRow[] | null;
  next: string | null;
}

// Literal, not a parameter: the partial indexes' predicates (drizzle/0010) only match literals.
const OPEN = sql`${garments.status} <> 'collected'`;
const COLLECTED = sql`${garments.status} = 'collected'`;

// Ticket, customer and assignee read per row by primary key (correlated subqueries): with joins
// the planner, misjudging how many rows are open, hashed every ticket of the database instead.
// Plain SQL: in a one-table select Drizzle leaves column names unqualified, which a subquery would
// read as its own table's.
const ticketNumber = sql<number>`(select t.number from tickets t where t.id = "garments"."ticket_id")`;
const customerOf = <T>(col: 'name' | 'phone' | 'updated_at') =>
  sql<T>`(select ${sql.raw(`c.${col}`)} from tickets t join customers c on c.id = t.customer_id where t.id = "garments"."ticket_id")`;
const assigneeOf = <T>(col: 'name' | 'updated_at') => sql<T>`(select ${sql.raw(`u.${col}`)} from "user" u where u.id = "garments"."assignee_id")`;

// A ready garment's wait counts from its last move to ready (the garment.moved audit events, as
// the overview reads them; audit_events_subject_idx finds them), read only for ready rows; a ready
// garment with no such event (written straight into the database) counts from its last change.
// ISO in UTC, so every browser's Date reads it.
const readyAt = sql<
  string | null
>`case when "garments"."status" = 'ready' then to_char(coalesce((select max(a.at) from audit_events a where a.shop_id = "garments"."shop_id" and a.subject = "garments"."id"::text and a.action = 'garment.moved' and a.detail->>'to' = 'ready'), "garments"."updated_at") at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') end`;

// The customer's phone only for roles that read customers (the queue's search finds by it); an
// apprentice works the garment, never calls its owner.
function rowsOf(where: SQL | undefined, phones: boolean) {
  return db
    .select({
      id: garments.id,
      description: garments.description,
      status: garments.status,
      dueOn: garments.dueOn,
      assigneeId: garments.assigneeId,
      assigneeName: assigneeOf<string | null>('name'),
      ticketId: garments.ticketId,
      ticketNumber: ticketNumber.mapWith(Number),
      customerName: customerOf<string | null>('name'),
      ...(phones ? { customerPhone: customerOf<string | null>('phone') } : {}),
      readyAt,
      position: garments.position,
      createdAt: sql<string>`"garments"."created_at"::text`,
    })
    .from(garments)
    .where(where);
}

type Read = Omit<QueueRow, 'description'> & { description: string | null; createdAt: string; position: number };
const shown = ({ createdAt: _, position: __, ...r }: Read): QueueRow => ({ ...r, description: r.description ?? 'Trousers' });

// The open list's order, as listQueue's SQL had it: due day (none last), ticket, place on the ticket, id.
function byDue(a: Read, b: Read): number {
  const due = (r: Read) => r.dueOn ?? '~';
  return due(a) < due(b) ? -1 : due(a) > due(b) ? 1 : a.ticketNumber - b.ticketNumber || a.position - b.position || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
}

/** The ETag of an answer: who asks (shop, person, role), what they asked, and a fingerprint of the data. */
function etagOf(actor: Actor, q: QueueQuery, fingerprint: string): string {
  const h = createHash('sha256').update(JSON.stringify([actor.shopId, actor.userId, actor.role, q.view, q.after ?? null, q.limit, fingerprint]));
  return `"q-${h.digest('base64url').slice(0, 32)}"`;
}

/** A fingerprint of the open rows without reading them out: how many, which, and the newest change
 * of each table the rows show (garments, customers, assignees' names). Any edit moves one of these. */
async function openFingerprint(actor: Actor): Promise<string> {
  const [f] = await db
    .select({
      n: sql<string>`count(*)::text`,
      // Which rows, with which customer and assignee: a swap keeps the counts but not this sum.
      ids: sql<string>`coalesce(sum(hashtext("garments"."id"::text || coalesce((select t.customer_id from tickets t where t.id = "garments"."ticket_id")::text, '') || coalesce("garments"."assignee_id", ''))::bigint), 0)::text`,
      g: sql<string>`max("garments"."updated_at")::text`,
      c: sql<string>`max(${customerOf('updated_at')})::text`,
      u: sql<string>`max(${assigneeOf('updated_at')})::text`,
    })
    .from(garments)
    .where(and(garmentVisibleTo(actor), OPEN));
  return JSON.stringify(f);
}

/** The queue for the actor: open work by due day, or one page of collected history, newest first. */
export async function readQueue(actor: Actor, q: QueueQuery, ifNoneMatch: string | null): Promise<QueueAnswer> {
  if (q.view === 'open') {
    const etag = etagOf(actor, q, await openFingerprint(actor));
    if (matches(ifNoneMatch, etag)) return { etag, rows: null, next: null };
    const rows = (await rowsOf(and(garmentVisibleTo(actor), OPEN), can(actor.role, ['customers', 'read']))) as Read[];
    return { etag, rows: rows.sort(byDue).map(shown), next: null };
  }
  const after = q.after ?? null;
  const page = (await rowsOf(
    and(
      garmentVisibleTo(actor),
      COLLECTED,
      after ? sql`(${garments.createdAt}, ${garments.id}) < (${after.createdAt}::timestamptz, ${after.id}::uuid)` : undefined,
    ),
    can(actor.role, ['customers', 'read']),
  )
    .orderBy(sql`${garments.createdAt} desc nulls last`, sql`${garments.id} desc nulls last`)
    .limit(q.limit + 1)) as Read[];
  const more = page.length > q.limit;
  const rows = page.slice(0, q.limit);
  const last = rows.at(-1);
  const next = more && last ? encodeCursor(last) : null;
  const shownRows = rows.map(shown);
  // A history page is read rarely: its ETag is simply the page itself.
  const etag = etagOf(
    actor,
    q,
    createHash('sha256')
      .update(JSON.stringify([shownRows, next]))
      .digest('base64url'),
  );
  return { etag, rows: matches(ifNoneMatch, etag) ? null : shownRows, next };
}

/** The queue's "Tailor" filter for the actor: only choices that can match a row they may see. */
export async function queueWhoOptions(actor: Actor): Promise<WhoOption[]> {
  const seesAll = can(actor.role, ['tickets', 'read-all']);
  return whoOptions(seesAll, seesAll ? await staffOf(actor) : [], actor.userId);
}

/** True when an If-None-Match header names the ETag (weak comparison, as for GET). */
function matches(header: string | null, etag: string): boolean {
  if (!header) return false;
  return header.split(',').some((t) => t.trim() === '*' || t.trim().replace(/^W\//, '') === etag);
}
