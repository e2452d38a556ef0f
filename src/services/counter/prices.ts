// The shop's price list and counter settings, and the price lines on its tickets.
import { and, asc, eq, inArray, isNull } from 'drizzle-orm';
import type { z } from 'zod';
import { db, type Db } from '@/db';
import {
  counterSettings,
  garments,
  measurements,
  priceItems,
  priceLines,
  type CounterSettings,
  type MeasurementRow,
  type PriceLine,
  type Ticket,
} from '@/db/schema';
import { checkTaper } from '@/lib/allowance';
import type { Actor } from '@/lib/server/api';
import { letDownFirst } from '@/lib/shared/existing-finish';
import { partOf, readFinish } from '@/lib/shared/fitting/kinds';
import { savedLegOrder, type StoredLeg } from '@/lib/server/fitting/saved-leg';
import { taperInput } from '@/lib/server/cut-sheet/build';
import type { autoLinesInput, lineInput, priceListInput, voidLineInput } from '@/lib/shared/counter-request';
import { isCurrency } from '@/lib/pricing/money';
import { DEFAULT_PRICE_LABELS, PRICE_KEYS } from '@/lib/pricing/price-keys';
import { isRushableWork, LEAD_REDUCTION_SHARE, priceTicket, reductionNeedsLead, sumMinor, type GarmentFacts, type PriceList } from '@/lib/pricing/price-lines';
import { can } from '@/lib/shared/roles';
import { needsLetOut } from '@/lib/pricing/taper-let-out';
import { audit } from '../audit';
import { ServiceError } from '../errors';
import { isUuid, shopTicket } from '../ticket-core';
import { withLinksClosed } from './payment-links';
import { kindsOf, liveKinds } from './price-kinds';
import { workKeyOf } from '@/lib/shared/fitting/garment-kinds';
import type { CounterView, PriceListView } from '@/lib/shared/counter-views';

// The shapes live in lib (islands read them too); exported here for the services' importers.
export type { CounterView, PriceListView };

/** The shop's counter settings, the defaults when the lead has not set them. */
export async function counterSettingsOf(shopId: string, q: Db = db): Promise<CounterView & Pick<CounterSettings, 'autoReadySince'>> {
  const [row] = await q.select().from(counterSettings).where(eq(counterSettings.shopId, shopId));
  return {
    currency: row && isCurrency(row.currency) ? row.currency : 'EUR',
    hours: row?.hours ?? '',
    location: row?.location ?? '',
    autoReadyNotice: row?.autoReadyNotice ?? false,
    autoReadySince: row?.autoReadySince ?? null,
  };
}

/** The shop's price list: every key, with the lead's label and amount (0 until set); read through `q` inside a transaction. */
export async function priceListOf(shopId: string, q: Db = db): Promise<PriceList> {
  const rows = await q.select().from(priceItems).where(eq(priceItems.shopId, shopId));
  const byKey = new Map(rows.map((r) => [r.key, r]));
  return Object.fromEntries(
    PRICE_KEYS.map((key) => [key, { label: byKey.get(key)?.label ?? DEFAULT_PRICE_LABELS[key], amountMinor: byKey.get(key)?.amountMinor ?? 0 }]),
  ) as PriceList;
}

/** The price list page: settings and every line. */
export async function getPriceList(actor: Actor): Promise<PriceListView> {
  const { autoReadySince: _, ...settings } = await counterSettingsOf(actor.shopId);
  const list = await priceListOf(actor.shopId);
  return { ...settings, items: PRICE_KEYS.map((key) => ({ key, ...list[key] })), kinds: await kindsOf(actor.shopId) };
}

/** Saves the lead's price list and settings (lines left out keep what they were); turning the automatic notice on starts it from now. */
export async function savePriceList(actor: Actor, input: z.infer<typeof priceListInput>): Promise<PriceListView> {
  const keys = new Set(input.items.map((i) => i.key));
  if (keys.size !== input.items.length) throw new ServiceError(422, 'Send each line of the price list once.');
  const before = await counterSettingsOf(actor.shopId);
  const listBefore = await priceListOf(actor.shopId);
  const since = input.autoReadyNotice ? (before.autoReadyNotice && before.autoReadySince ? before.autoReadySince : new Date()) : null;
  await db.transaction(async (tx) => {
    const settings = {
      currency: input.currency,
      hours: input.hours,
      location: input.location,
      autoReadyNotice: input.autoReadyNotice,
      autoReadySince: since,
      updatedAt: new Date(),
    };
    await tx
      .insert(counterSettings)
      .values({ shopId: actor.shopId, ...settings })
      .onConflictDoUpdate({ target: counterSettings.shopId, set: settings });
    for (const item of input.items) {
      await tx
        .insert(priceItems)
        .values({ shopId: actor.shopId, ...item })
        .onConflictDoUpdate({ target: [priceItems.shopId, priceItems.key], set: { label: item.label, amountMinor: item.amountMinor, updatedAt: new Date() } });
    }
    await audit(tx, actor.shopId, actor.userId, 'prices.saved', actor.shopId, { currency: input.currency });
    // The price list's history: each worked-out line whose name or amount changed (old → new).
    for (const item of input.items) {
      const was = listBefore[item.key];
      const changes = [
        ...(was.label !== item.label ? [{ field: 'name', from: was.label, to: item.label }] : []),
        ...(was.amountMinor !== item.amountMinor ? [{ field: 'amountMinor', from: was.amountMinor, to: item.amountMinor }] : []),
      ];
      if (changes.length) await audit(tx, actor.shopId, actor.userId, 'price-item.changed', actor.shopId, { key: item.key, line: item.label, changes });
    }
  });
  return getPriceList(actor);
}

/** The ticket's price lines, oldest first. */
export async function listLines(actor: Actor, ticketId: string): Promise<PriceLine[]> {
  await shopTicket(actor, ticketId);
  return linesOf(actor.shopId, ticketId);
}

/** The lines of a ticket known to be the shop's (read through `q`, a transaction when given). */
export function linesOf(shopId: string, ticketId: string, q: Db = db): Promise<PriceLine[]> {
  return q
    .select()
    .from(priceLines)
    .where(and(eq(priceLines.shopId, shopId), eq(priceLines.ticketId, ticketId)))
    .orderBy(asc(priceLines.createdAt), asc(priceLines.id));
}

async function refuseWhenSettled(_tx: Db, ticket: Ticket): Promise<void> {
  // Until the hand-over the price may change either way: a rise is due again, a drop paid for
  // already is a credit owed to the customer (see summary.ts), never lost.
  if (ticket.status === 'collected') throw new ServiceError(422, 'This ticket is collected: its price is closed.');
}

const live = (lines: PriceLine[]) => lines.filter((l) => !l.voidedAt);

/** Refuses a change that would leave the ticket's total below zero. */
function refuseBelowZero(totalAfter: number): void {
  if (totalAfter < 0) throw new ServiceError(422, 'That would take the ticket total below zero: a total is never less than 0.00.');
}

/** Replaces the ticket's worked-out lines with those its garments' finishes and plans call for;
 * rush follows `RUSH_RULE` (one line, on any work, also work added by hand). */
export async function priceFromGarments(
  actor: Actor,
  ticketId: string,
  input: z.infer<typeof autoLinesInput>,
): Promise<{ lines: PriceLine[]; unpriced: string[] }> {
  await shopTicket(actor, ticketId);
  const facts = await garmentFacts(actor.shopId, ticketId);
  const list = await priceListOf(actor.shopId);
  let unpriced: string[] = [];
  // The ticket's open pay link asks for the old balance: it is closed at the service first.
  await withLinksClosed(actor.shopId, ticketId, refuseWhenSettled, async (tx, ticket) => {
    await refuseWhenSettled(tx, ticket);
    const kept = live(await linesOf(actor.shopId, ticketId, tx)).filter((l) => l.source !== 'auto');
    const handRush = kept.filter((l) => l.key === 'rush');
    // A rush line added by hand counts as the rush: the box adds none beside it, and unticked takes it off.
    const priced = priceTicket(facts, list, { rush: input.rush && handRush.length === 0, otherWork: kept.some(isRushableWork) });
    unpriced = priced.unpriced;
    const lines = priced.lines;
    if (!input.rush && handRush.length > 0) {
      await tx
        .update(priceLines)
        .set({ voidedAt: new Date(), voidedById: actor.userId, voidReason: 'Rush unticked when pricing from the garments' })
        .where(
          inArray(
            priceLines.id,
            handRush.map((l) => l.id),
          ),
        );
    }
    await tx
      .delete(priceLines)
      .where(and(eq(priceLines.ticketId, ticketId), eq(priceLines.shopId, actor.shopId), eq(priceLines.source, 'auto'), isNull(priceLines.voidedAt)));
    const keptTotal = sumMinor(kept.filter((l) => input.rush || l.key !== 'rush'));
    refuseBelowZero(keptTotal + sumMinor(lines));
    if (lines.length > 0) {
      // One transaction shares one now(): a millisecond apart keeps the lines in the garments' order.
      const at = Date.now();
      await tx
        .insert(priceLines)
        .values(
          lines.map((l, i) => ({ ...l, shopId: actor.shopId, ticketId, source: 'auto' as const, createdById: actor.userId, createdAt: new Date(at + i) })),
        );
    }
    await audit(tx, actor.shopId, actor.userId, 'prices.from-garments', ticketId, { lines: lines.length, rush: input.rush });
  });
  return { lines: await linesOf(actor.shopId, ticketId), unpriced };
}

/** Adds a line from the list, an adjustment with its reason, or "no charge" with its reason. A
 * reduction below zero is refused; one over `LEAD_REDUCTION_SHARE` of the total needs the lead. */
export async function addLine(actor: Actor, ticketId: string, input: z.infer<typeof lineInput>): Promise<PriceLine> {
  // Checked on the ticket first: another shop's ticket is 404 whatever the body names.
  await shopTicket(actor, ticketId);
  const entry = input.source === 'list' ? (await priceListOf(actor.shopId))[input.key] : null;
  // A kind of work is copied onto the line (name, amount, rush): later changes to the list leave it as it was.
  const kind = input.source === 'kind' ? (await liveKinds(db, actor.shopId, [input.kindId])).get(input.kindId)! : null;
  const values =
    input.source === 'list'
      ? { key: input.key, label: entry!.label, amountMinor: entry!.amountMinor, reason: null }
      : kind
        ? { key: null, kindId: kind.id, rushApplies: kind.rushApplies, label: kind.name, amountMinor: kind.amountMinor, reason: null }
        : input.source === 'adjust'
          ? { key: null, label: input.label, amountMinor: input.amountMinor, reason: input.reason }
          : { key: null, label: 'No charge', amountMinor: 0, reason: input.source === 'no-charge' ? input.reason : '' };
  const check = async (tx: Db, ticket: Ticket) => {
    await refuseWhenSettled(tx, ticket);
    const lines = live(await linesOf(actor.shopId, ticketId, tx));
    const total = sumMinor(lines);
    if (input.source === 'list' && input.key === 'rush') {
      if (lines.some((l) => l.key === 'rush')) throw new ServiceError(409, 'Rush is already on this ticket: it is charged once per ticket.');
      if (!lines.some(isRushableWork)) throw new ServiceError(422, 'Rush goes on a ticket with work priced on it: price the work first.');
    }
    if (input.source === 'no-charge') {
      if (total !== 0 || lines.some((l) => l.source === 'no-charge')) throw new ServiceError(422, 'No charge is only for a ticket whose total is 0.00, once.');
    }
    refuseBelowZero(total + values.amountMinor);
    if (input.source === 'adjust' && reductionNeedsLead(values.amountMinor, total) && !can(actor.role, ['prices', 'reduce-any'])) {
      throw new ServiceError(422, `Taking off more than ${LEAD_REDUCTION_SHARE * 100} % of the ticket total needs the lead.`);
    }
  };
  const row = await withLinksClosed(actor.shopId, ticketId, check, async (tx, ticket) => {
    await check(tx, ticket);
    // A kind's line is a line from the list: the same rush rule and the same history.
    const source = input.source === 'kind' ? ('list' as const) : input.source;
    const [added] = await tx
      .insert(priceLines)
      .values({ ...values, source, shopId: actor.shopId, ticketId, createdById: actor.userId })
      .returning();
    const action = input.source === 'adjust' ? 'prices.adjusted' : input.source === 'no-charge' ? 'prices.no-charge' : 'prices.line-added';
    await audit(tx, actor.shopId, actor.userId, action, ticketId, { line: added!.id, amountMinor: added!.amountMinor, reason: added!.reason });
    return added!;
  });
  return row;
}

/** Voids a wrong line with its reason: it stays on the ticket (struck through) and in the history,
 * and leaves the total. Refused when the total would go below zero (void the reduction first). */
export async function voidLine(actor: Actor, ticketId: string, lineId: string, input: z.infer<typeof voidLineInput>): Promise<PriceLine> {
  await shopTicket(actor, ticketId);
  if (!isUuid(lineId)) throw new ServiceError(404, 'No such line on this ticket.');
  const check = async (tx: Db, ticket: Ticket) => {
    await refuseWhenSettled(tx, ticket);
    const lines = await linesOf(actor.shopId, ticketId, tx);
    const line = lines.find((l) => l.id === lineId);
    if (!line) throw new ServiceError(404, 'No such line on this ticket.');
    if (line.voidedAt) throw new ServiceError(409, 'This line is already voided.');
    refuseBelowZero(sumMinor(live(lines)) - line.amountMinor);
    return line;
  };
  return withLinksClosed(actor.shopId, ticketId, check, async (tx, ticket) => {
    const line = await check(tx, ticket);
    const [voided] = await tx
      .update(priceLines)
      .set({ voidedAt: new Date(), voidedById: actor.userId, voidReason: input.reason })
      .where(and(eq(priceLines.id, line.id), isNull(priceLines.voidedAt)))
      .returning();
    await audit(tx, actor.shopId, actor.userId, 'prices.line-voided', ticketId, {
      line: line.id,
      label: line.label,
      amountMinor: line.amountMinor,
      reason: input.reason,
    });
    return voided!;
  });
}

/** What the pricing needs to know of each garment on the ticket, read from its measurements. */
export async function garmentFacts(shopId: string, ticketId: string): Promise<GarmentFacts[]> {
  const rows = await db
    .select()
    .from(garments)
    .where(and(eq(garments.shopId, shopId), eq(garments.ticketId, ticketId)))
    .orderBy(asc(garments.position));
  const legs =
    rows.length === 0
      ? []
      : await db
          .select()
          .from(measurements)
          .where(
            and(
              eq(measurements.shopId, shopId),
              inArray(
                measurements.garmentId,
                rows.map((g) => g.id),
              ),
            ),
          );
  return rows.map((g, i) => {
    const own = legs.filter((m) => m.garmentId === g.id);
    // The fitting's finish wins over the one noted at intake.
    const finish = finishOf(own[0]?.finish ?? g.finish ?? null);
    return {
      garmentId: g.id,
      label: g.description?.trim() || `Garment ${i + 1}`,
      finish,
      taperLetOut: finish === 'cuff' && own.some((m) => legNeedsLetOut(m, letDownFirst(g.existingFinish))),
      // Noted at intake (or on the garment since): an old cuff is let down before it is made again.
      oldCuff: g.existingFinish === 'cuff',
      workKey: workKeyOf(g.kind),
    };
  });
}

// Measurements store cuff|plain|slope|original, garments cuff|hem|original: the registry reads both;
// pricing wants the part, or the kept factory hem, which has a price of its own.
function finishOf(value: string | null): GarmentFacts['finish'] {
  const finish = readFinish(value);
  if (finish === 'original') return 'original';
  return finish ? partOf(finish) : null;
}

/** Runs the engine's taper check on a leg's stored lengths, read as the sheet reads them (savedLegOrder; a let-down pair's width at the cut used); false when the leg has no taper widths. */
function legNeedsLetOut(m: MeasurementRow, letDown: boolean): boolean {
  const unit = m.unit === 'cm' || m.unit === 'mm' ? m.unit : 'in';
  const order = savedLegOrder({ leg: m.leg, unit, finish: m.finish, values: storedValues(m.values) }, unit, 8, { letDown });
  if (order?.finish !== 'cuff' || !order.taper) return false;
  try {
    return needsLetOut(checkTaper(taperInput(order.input, order.taper)));
  } catch {
    // Lengths the engine refuses leave the price to the counter, who can add the line by hand.
    return false;
  }
}

// Each stored length is { text, mm }; a bare string or number is read as its text.
function storedValues(raw: unknown): StoredLeg['values'] {
  const out: Record<string, { text: string }> = {};
  for (const [k, v] of Object.entries((raw ?? {}) as Record<string, unknown>)) {
    if (typeof v === 'string' || typeof v === 'number') out[k] = { text: String(v) };
    else if (v && typeof v === 'object' && 'text' in v) out[k] = { text: String((v as { text: unknown }).text) };
  }
  return out;
}
