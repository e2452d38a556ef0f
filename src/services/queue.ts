// The queue as the API reads it: open work (not yet collected) by default, the collected history
// a page at a time (newest taken in first, by cursor), each answer with an ETag so an unchanged
// list costs a 304. The ETag is the shop's list version (one row, moved by database triggers with
// every write the list shows) and who asks, so it never matches across shops, people or roles; an
// answer's rows and JSON are kept per version, so other clients' 200s do not read them again.
import { createHash } from 'node:crypto';
import { and, sql, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import { garments } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { QueueRow, WhoOption } from '@/lib/shared/bench-types';
import { whoOptions } from '@/lib/shared/queue-filter';
import { encodeCursor, type QueueCursor } from '@/lib/shared/queue-request';
import { can } from '@/lib/shared/roles';
import { garmentVisibleTo, staffOf } from './garments';
import { kindOf } from '@/lib/shared/fitting/garment-kinds';
import { listVersion } from './list-version';

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
  /** shared with other answers of the same version: never change them */
  rows: readonly QueueRow[] | null;
  /** the rows as JSON in UTF-8, as the endpoint sends them (shared too) */
  body: Uint8Array<ArrayBuffer> | null;
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
      kind: garments.kind,
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

type Read = Omit<QueueRow, 'description' | 'kind'> & { description: string | null; kind: string; createdAt: string; position: number };
const shown = ({ createdAt: _, position: __, ...r }: Read): QueueRow => ({ ...r, kind: kindOf(r.kind), description: r.description ?? 'Trousers' });

// The open list's order, as listQueue's SQL had it: due day (none last), ticket, place on the ticket, id.
function byDue(a: Read, b: Read): number {
  const due = (r: Read) => r.dueOn ?? '~';
  return due(a) < due(b) ? -1 : due(a) > due(b) ? 1 : a.ticketNumber - b.ticketNumber || a.position - b.position || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
}

/** The ETag of an answer: who asks (shop, person, role), what they asked, and the shop's list version. */
function etagOf(actor: Actor, q: QueueQuery, version: string): string {
  const h = createHash('sha256').update(JSON.stringify([actor.shopId, actor.userId, actor.role, q.view, q.after ?? null, q.limit, version]));
  return `"q-${h.digest('base64url').slice(0, 32)}"`;
}

/** A computed answer: the rows, their JSON as sent, and the next page's cursor. */
interface Computed {
  rows: QueueRow[];
  /** UTF-8 once, not per answer */
  body: Uint8Array<ArrayBuffer>;
  next: string | null;
}

// Answers kept in this process per question (shop, what the role may see, view, page), each with the
// version it was read at, and used only while the database still says that version: a write
// anywhere (another server too) moves the version, so a kept answer is never served stale. Bounded,
// oldest question out. Rows are read after the version, so a kept answer is never older than its version.
const KEPT_MAX = 200;
const kept = new Map<string, { version: string; answer: Promise<Computed> }>();

const utf8 = (rows: QueueRow[]) => Buffer.from(JSON.stringify(rows));

async function compute(actor: Actor, q: QueueQuery): Promise<Computed> {
  const phones = can(actor.role, ['customers', 'read']);
  if (q.view === 'open') {
    const rows = ((await rowsOf(and(garmentVisibleTo(actor), OPEN), phones)) as Read[]).sort(byDue).map(shown);
    return { rows, body: utf8(rows), next: null };
  }
  const after = q.after ?? null;
  const page = (await rowsOf(
    and(
      garmentVisibleTo(actor),
      COLLECTED,
      after ? sql`(${garments.createdAt}, ${garments.id}) < (${after.createdAt}::timestamptz, ${after.id}::uuid)` : undefined,
    ),
    phones,
  )
    .orderBy(sql`${garments.createdAt} desc nulls last`, sql`${garments.id} desc nulls last`)
    .limit(q.limit + 1)) as Read[];
  const last = page.length > q.limit ? page[q.limit - 1] : undefined;
  const rows = page.slice(0, q.limit).map(shown);
  return { rows, body: utf8(rows), next: last ? encodeCursor(last) : null };
}

/** The kept answer to this question at this version, or a new one (one read however many ask at once). */
function answerAt(actor: Actor, q: QueueQuery, version: string): Promise<Computed> {
  // What the rows depend on besides the shop: everything (or only their own and unassigned work), phones or not.
  const scope = can(actor.role, ['tickets', 'read-all']) ? '*' : `u:${actor.userId}`;
  const key = JSON.stringify([actor.shopId, scope, can(actor.role, ['customers', 'read']), q.view, q.after ?? null, q.view === 'open' ? null : q.limit]);
  const hit = kept.get(key);
  if (hit?.version === version) return hit.answer;
  const answer = compute(actor, q);
  // A slower request that read an older version does not push out a newer answer.
  if (!hit || BigInt(version) > BigInt(hit.version)) {
    kept.delete(key);
    if (kept.size >= KEPT_MAX) kept.delete(kept.keys().next().value!);
    kept.set(key, { version, answer });
    answer.catch(() => kept.get(key)?.answer === answer && kept.delete(key));
  }
  return answer;
}

/** The queue for the actor: open work by due day, or one page of collected history, newest first.
 * An unchanged list (the shop's version as the client's ETag says) costs one read by primary key. */
export async function readQueue(actor: Actor, q: QueueQuery, ifNoneMatch: string | null): Promise<QueueAnswer> {
  const version = await listVersion(actor.shopId);
  const etag = etagOf(actor, q, version);
  // The next cursor is in the ETag's question (q.after) and version, so a 304 needs no rows; a history
  // 304 still reads its page for the Link header, from the kept answer when there is one.
  if (matches(ifNoneMatch, etag) && q.view === 'open') return { etag, rows: null, body: null, next: null };
  const answer = await answerAt(actor, q, version);
  if (matches(ifNoneMatch, etag)) return { etag, rows: null, body: null, next: answer.next };
  return { etag, rows: answer.rows, body: answer.body, next: answer.next };
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
