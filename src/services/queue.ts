// The queue as the API reads it: open work (not yet collected) by default, the collected history
// a page at a time (newest taken in first, by cursor), each answer with an ETag so an unchanged
// list costs a 304. The open list's ETag comes from one aggregate over the same rows (no rows
// leave the database for it); every ETag also holds who asks, so it never matches across shops,
// people or roles.
import { createHash } from 'node:crypto';
import { and, asc, eq, sql, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import { customers, garments, tickets, user } from '@/db/schema';
import type { Actor } from '@/lib/api';
import type { QueueRow } from '@/lib/bench-types';
import { isUuid } from '@/lib/ids';
import { garmentVisibleTo } from './garments';
import { ServiceError } from './errors';

/** What the queue API is asked: open work, or a page of history after a cursor. */
export interface QueueQuery {
  view: 'open' | 'history';
  /** the cursor of the last row of the page before (history only) */
  after?: string;
  /** rows per history page */
  limit: number;
}

/** An answer: the rows (null when the client's ETag still holds), the ETag, and the next page's cursor. */
export interface QueueAnswer {
  etag: string;
  rows: QueueRow[] | null;
  next: string | null;
}

// Literal, not a parameter: the partial indexes' predicates (drizzle/0009) only match literals.
const OPEN = sql`${garments.status} <> 'collected'`;
const COLLECTED = sql`${garments.status} = 'collected'`;

const columns = {
  id: garments.id,
  description: garments.description,
  status: garments.status,
  dueOn: garments.dueOn,
  assigneeId: garments.assigneeId,
  assigneeName: user.name,
  ticketId: garments.ticketId,
  ticketNumber: tickets.number,
  customerName: customers.name,
};

function rowsOf(where: SQL | undefined) {
  return db
    .select({ ...columns, createdAt: sql<string>`${garments.createdAt}::text` })
    .from(garments)
    .innerJoin(tickets, eq(tickets.id, garments.ticketId))
    .leftJoin(customers, eq(customers.id, tickets.customerId))
    .leftJoin(user, eq(user.id, garments.assigneeId))
    .where(where);
}

const shown = ({ createdAt: _, ...r }: QueueRow & { createdAt: string }): QueueRow => ({ ...r, description: r.description ?? 'Trousers' });

/** The ETag of an answer: who asks (shop, person, role), what they asked, and a fingerprint of the data. */
function etagOf(actor: Actor, q: QueueQuery, fingerprint: string): string {
  const h = createHash('sha256').update(JSON.stringify([actor.shopId, actor.userId, actor.role, q.view, q.after ?? '', q.limit, fingerprint]));
  return `"q-${h.digest('base64url').slice(0, 32)}"`;
}

/** A fingerprint of the open rows without reading them out: how many, which, and the newest change
 * of each table the rows show (garments, customers, assignees' names). Any edit moves one of these. */
async function openFingerprint(actor: Actor): Promise<string> {
  const [f] = await db
    .select({
      n: sql<string>`count(*)::text`,
      // Which rows, with which customer and assignee: a swap keeps the counts but not this sum.
      ids: sql<string>`coalesce(sum(hashtext(${garments.id}::text || coalesce(${tickets.customerId}::text, '') || coalesce(${user.id}, ''))::bigint), 0)::text`,
      g: sql<string>`max(${garments.updatedAt})::text`,
      c: sql<string>`max(${customers.updatedAt})::text`,
      u: sql<string>`max(${user.updatedAt})::text`,
    })
    .from(garments)
    .innerJoin(tickets, eq(tickets.id, garments.ticketId))
    .leftJoin(customers, eq(customers.id, tickets.customerId))
    .leftJoin(user, eq(user.id, garments.assigneeId))
    .where(and(garmentVisibleTo(actor), OPEN));
  return JSON.stringify(f);
}

/** A history cursor: the last row's intake time (as the database prints it, to the microsecond) and id. */
export function encodeCursor(createdAt: string, id: string): string {
  return Buffer.from(`${createdAt}|${id}`).toString('base64url');
}

function decodeCursor(cursor: string): { createdAt: string; id: string } {
  const [createdAt = '', id = ''] = Buffer.from(cursor, 'base64url').toString().split('|');
  if (!/^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d(\.\d{1,6})?[+-]\d\d(:\d\d)?$/.test(createdAt) || !isUuid(id)) {
    throw new ServiceError(400, 'The page cursor is not one this queue gave out; start again from the first page.');
  }
  return { createdAt, id };
}

/** The queue for the actor: open work by due day, or one page of collected history, newest first. */
export async function readQueue(actor: Actor, q: QueueQuery, ifNoneMatch: string | null): Promise<QueueAnswer> {
  if (q.view === 'open') {
    const etag = etagOf(actor, q, await openFingerprint(actor));
    if (matches(ifNoneMatch, etag)) return { etag, rows: null, next: null };
    const rows = await rowsOf(and(garmentVisibleTo(actor), OPEN)).orderBy(asc(garments.dueOn), asc(tickets.number), asc(garments.position), asc(garments.id));
    return { etag, rows: rows.map(shown), next: null };
  }
  const after = q.after ? decodeCursor(q.after) : null;
  const page = await rowsOf(
    and(garmentVisibleTo(actor), COLLECTED, after ? sql`(${garments.createdAt}, ${garments.id}) < (${after.createdAt}::timestamptz, ${after.id}::uuid)` : undefined),
  )
    .orderBy(sql`${garments.createdAt} desc nulls last`, sql`${garments.id} desc nulls last`)
    .limit(q.limit + 1);
  const more = page.length > q.limit;
  const rows = page.slice(0, q.limit);
  const last = rows.at(-1);
  const next = more && last ? encodeCursor(last.createdAt, last.id) : null;
  const shownRows = rows.map(shown);
  // A history page is read rarely: its ETag is simply the page itself.
  const etag = etagOf(actor, q, createHash('sha256').update(JSON.stringify([shownRows, next])).digest('base64url'));
  return { etag, rows: matches(ifNoneMatch, etag) ? null : shownRows, next };
}

/** True when an If-None-Match header names the ETag (weak comparison, as for GET). */
function matches(header: string | null, etag: string): boolean {
  if (!header) return false;
  return header.split(',').some((t) => t.trim() === '*' || t.trim().replace(/^W\//, '') === etag);
}
