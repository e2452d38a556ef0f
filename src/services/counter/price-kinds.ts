// The lead's kinds of work on the price list ("Replace zip", "Taper legs"): added, renamed,
// re-priced, retired, never deleted; and the price list's history (who, when, old → new), kept as
// audit events written in the change's own transaction.
import { and, asc, desc, eq, inArray, isNull, ne, sql } from 'drizzle-orm';
import type { z } from 'zod';
import { db, type Db } from '@/db';
import { auditEvents, priceKinds, user, type PriceKind } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { priceKindInput, priceKindPatch } from '@/lib/shared/counter-request';
import type { PriceChange, PriceKindView } from '@/lib/shared/counter-views';
import { audit } from '../audit';
import { ServiceError } from '../errors';
import { isUuid } from '../ticket-core';

/** The audit actions that make up the price list's history. */
export const PRICE_HISTORY_ACTIONS = ['price-kind.added', 'price-kind.changed', 'price-item.changed'] as const;

type Change = PriceChange['changes'][number];

/** The refusal for a kind that is not the shop's (or an id that is not one): the same either way. */
function noSuchKind(status: 404 | 422): ServiceError {
  return new ServiceError(status, 'No such kind of work on this shop’s price list.');
}

function view(k: PriceKind): PriceKindView {
  return { id: k.id, name: k.name, amountMinor: k.amountMinor, rushApplies: k.rushApplies, retiredAt: k.retiredAt };
}

function isUniqueViolation(e: unknown): boolean {
  for (let err = e as { code?: string; cause?: unknown } | undefined; err; err = err.cause as typeof err) {
    if (err.code === '23505') return true;
  }
  return false;
}

const nameTaken = (name: string) => new ServiceError(409, `“${name}” is already on the price list: rename or retire that one first.`);

/** Refuses a name a live kind of the shop already has (letter case aside), other than `except`. */
async function refuseTakenName(tx: Db, shopId: string, name: string, except?: string): Promise<void> {
  const [other] = await tx
    .select({ id: priceKinds.id })
    .from(priceKinds)
    .where(
      and(
        eq(priceKinds.shopId, shopId),
        isNull(priceKinds.retiredAt),
        sql`lower(${priceKinds.name}) = lower(${name})`,
        except ? ne(priceKinds.id, except) : undefined,
      ),
    );
  if (other) throw nameTaken(name);
}

/** Runs a write whose unique index may still refuse a name taken at the same moment: 409, not 500. */
async function withNameCheck<T>(name: string, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (e) {
    if (isUniqueViolation(e)) throw nameTaken(name || 'That name');
    throw e;
  }
}

/** The shop's kinds of work: live ones first, then retired ones, each in the order added. */
export async function kindsOf(shopId: string, q: Db = db): Promise<PriceKindView[]> {
  const rows = await q
    .select()
    .from(priceKinds)
    .where(eq(priceKinds.shopId, shopId))
    .orderBy(sql`${priceKinds.retiredAt} is not null`, asc(priceKinds.createdAt), asc(priceKinds.id));
  return rows.map(view);
}

/** Adds a kind of work to the shop's list, with its history entry. */
export async function addKind(actor: Actor, input: z.infer<typeof priceKindInput>): Promise<PriceKindView> {
  return withNameCheck(input.name, () =>
    db.transaction(async (tx) => {
      await refuseTakenName(tx, actor.shopId, input.name);
      const [row] = await tx
        .insert(priceKinds)
        .values({ shopId: actor.shopId, name: input.name, amountMinor: input.amountMinor, rushApplies: input.rushApplies })
        .returning();
      const changes: Change[] = [
        { field: 'name', from: null, to: row!.name },
        { field: 'amountMinor', from: null, to: row!.amountMinor },
        { field: 'rushApplies', from: null, to: row!.rushApplies },
      ];
      await audit(tx, actor.shopId, actor.userId, 'price-kind.added', row!.id, { line: row!.name, changes });
      return view(row!);
    }),
  );
}

/** Renames, re-prices, sets rush, retires or brings back a kind; tickets keep the lines they have. */
export async function changeKind(actor: Actor, kindId: string, patch: z.infer<typeof priceKindPatch>): Promise<PriceKindView> {
  if (!isUuid(kindId)) throw noSuchKind(404);
  const name = patch.name ?? '';
  return withNameCheck(name, () =>
    db.transaction(async (tx) => {
      const [was] = await tx
        .select()
        .from(priceKinds)
        .where(and(eq(priceKinds.id, kindId), eq(priceKinds.shopId, actor.shopId)))
        .for('update');
      if (!was) throw noSuchKind(404);
      const retiredNow = patch.retired === undefined ? was.retiredAt !== null : patch.retired;
      const next = { name: patch.name ?? was.name, amountMinor: patch.amountMinor ?? was.amountMinor, rushApplies: patch.rushApplies ?? was.rushApplies };
      const changes: Change[] = [];
      if (next.name !== was.name) changes.push({ field: 'name', from: was.name, to: next.name });
      if (next.amountMinor !== was.amountMinor) changes.push({ field: 'amountMinor', from: was.amountMinor, to: next.amountMinor });
      if (next.rushApplies !== was.rushApplies) changes.push({ field: 'rushApplies', from: was.rushApplies, to: next.rushApplies });
      if (retiredNow !== (was.retiredAt !== null)) changes.push({ field: 'retired', from: was.retiredAt !== null, to: retiredNow });
      if (changes.length === 0) return view(was);
      // A kind back on the list (or renamed while on it) must not share a live kind's name.
      if (!retiredNow && (next.name.toLowerCase() !== was.name.toLowerCase() || was.retiredAt !== null))
        await refuseTakenName(tx, actor.shopId, next.name, was.id);
      const retiredAt = retiredNow ? (was.retiredAt ?? new Date()) : null;
      const [row] = await tx
        .update(priceKinds)
        .set({ ...next, retiredAt, updatedAt: new Date() })
        .where(eq(priceKinds.id, was.id))
        .returning();
      await audit(tx, actor.shopId, actor.userId, 'price-kind.changed', was.id, { line: row!.name, changes });
      return view(row!);
    }),
  );
}

/** Live kinds of the shop by id, read through `q` (the caller's transaction). An id that is not the
 * shop's is refused exactly as one that names nothing (422: it came in a body); a retired one is named. */
export async function liveKinds(q: Db, shopId: string, ids: readonly string[]): Promise<Map<string, PriceKind>> {
  const wanted = [...new Set(ids)];
  if (wanted.length === 0) return new Map();
  const rows = await q
    .select()
    .from(priceKinds)
    .where(and(eq(priceKinds.shopId, shopId), inArray(priceKinds.id, wanted)));
  const byId = new Map(rows.map((r) => [r.id, r]));
  for (const id of wanted) {
    const k = byId.get(id);
    if (!k) throw noSuchKind(422);
    if (k.retiredAt) throw new ServiceError(422, `“${k.name}” is retired from the price list: pick a kind of work still on it.`);
  }
  return byId;
}

/** The price list's history, newest first: every kind added or changed and every worked-out line re-priced or renamed. */
export async function priceHistory(actor: Actor, limit = 200): Promise<PriceChange[]> {
  const rows = await db
    .select({ id: auditEvents.id, at: auditEvents.at, actorName: user.name, action: auditEvents.action, detail: auditEvents.detail })
    .from(auditEvents)
    .leftJoin(user, eq(user.id, auditEvents.actorId))
    .where(and(eq(auditEvents.shopId, actor.shopId), inArray(auditEvents.action, [...PRICE_HISTORY_ACTIONS])))
    .orderBy(desc(auditEvents.at), desc(auditEvents.id))
    .limit(limit);
  return rows.map((r) => {
    const d = r.detail as { line?: string; changes?: Change[] };
    return { id: r.id, at: r.at.toISOString(), actorName: r.actorName, action: r.action, line: d.line ?? '', changes: d.changes ?? [] };
  });
}
