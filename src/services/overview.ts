// The lead's overview: a period's intake, hand-overs, due work, takings and time to ready, counted
// with SQL aggregates on the shop's own rows only. Days are the shop's, in its time zone: the day
// boundaries come from `dayBounds` (Intl) and SQL's width_bucket puts each moment between them, so
// the database's own time-zone data never decides a day.
import { and, count, eq, gte, inArray, lt, ne, notInArray, sql, type SQL, type SQLWrapper } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, counterSettings, garments, payments, refunds } from '@/db/schema';
import { GARMENT_STEPS, stepLabel, type GarmentStep } from '@/lib/shared/garment-steps';
import type { Overview, OverviewDay } from '@/lib/shared/overview/overview-types';
import { isCurrency, type Currency } from '@/lib/pricing/money';
import { dayBounds, dayOf, periodDays, type Period } from '@/lib/shared/overview/shop-days';
import { benchSettings } from './shop-settings';
import { shopTimeZone } from './shop-time-zone';

/** Steps at which a garment is not yet ready (its due date can pass). */
const NOT_READY: GarmentStep[] = GARMENT_STEPS.filter((s) => s !== 'ready' && s !== 'collected');
const DAY_SECONDS = 86_400;

/** The overview of the shop for the period around `now`, in the shop's time zone. */
export async function shopOverview(shopId: string, period: Period, now = new Date()): Promise<Overview> {
  const [{ timeZone }, currency, bench] = await Promise.all([shopTimeZone(shopId), shopCurrency(shopId), benchSettings(shopId)]);
  const today = dayOf(now, timeZone);
  const days = periodDays(period, today);
  const bounds = dayBounds(days, timeZone);
  const start = bounds[0]!;
  const end = bounds[bounds.length - 1]!;
  // width_bucket gives 1 for the first day … n for the last (0 and n+1 lie outside, filtered out).
  const edges = sql.join(
    bounds.map((b) => sql`${b.toISOString()}::timestamptz`),
    sql`, `,
  );
  const bucket = (at: SQLWrapper) => sql<number>`width_bucket(${at}, array[${edges}])`.mapWith(Number);
  const n = sql<number>`count(*)`.mapWith(Number);
  const moved = (to: GarmentStep) =>
    and(
      eq(auditEvents.shopId, shopId),
      eq(auditEvents.action, 'garment.moved'),
      sql`${auditEvents.detail}->>'to' = ${to}`,
      sql`${auditEvents.detail}->>'back' is null`,
      gte(auditEvents.at, start),
      lt(auditEvents.at, end),
    );

  const [takenIn, movedOut, pickedUp, due, before, overdueNow, waiting, takings, givenBack, ready] = await Promise.all([
    db
      .select({ b: bucket(garments.createdAt), n })
      .from(garments)
      .where(and(eq(garments.shopId, shopId), gte(garments.createdAt, start), lt(garments.createdAt, end)))
      .groupBy(sql`1`),
    // Handed over one garment at a time…
    db
      .select({ b: bucket(auditEvents.at), n })
      .from(auditEvents)
      .where(moved('collected'))
      .groupBy(sql`1`),
    // …or a whole ticket at the counter before pickups recorded each garment's move: its garments
    // collected without a move of their own (a pickup now writes garment.moved, counted above).
    db
      .select({ b: bucket(auditEvents.at), n: sql<number>`count(${garments.id})`.mapWith(Number) })
      .from(auditEvents)
      .innerJoin(
        garments,
        and(
          eq(garments.shopId, auditEvents.shopId),
          sql`${garments.ticketId}::text = ${auditEvents.subject}`,
          eq(garments.status, 'collected'),
          sql`not exists (select 1 from ${auditEvents} m where m.shop_id = ${garments.shopId} and m.action = 'garment.moved' and m.subject = ${garments.id}::text and m.detail->>'to' = 'collected')`,
        ),
      )
      .where(and(eq(auditEvents.shopId, shopId), eq(auditEvents.action, 'ticket.collected'), gte(auditEvents.at, start), lt(auditEvents.at, end)))
      .groupBy(sql`1`),
    db
      .select({
        day: garments.dueOn,
        open: sql<number>`count(*) filter (where ${inArray(garments.status, NOT_READY)})`.mapWith(Number),
        done: sql<number>`count(*) filter (where ${notInArray(garments.status, NOT_READY)})`.mapWith(Number),
      })
      .from(garments)
      .where(and(eq(garments.shopId, shopId), gte(garments.dueOn, days[0]!), sql`${garments.dueOn} <= ${days[days.length - 1]!}`))
      .groupBy(garments.dueOn),
    db
      .select({ n: count() })
      .from(garments)
      .where(and(eq(garments.shopId, shopId), inArray(garments.status, NOT_READY), lt(garments.dueOn, days[0]!))),
    db
      .select({ n: count() })
      .from(garments)
      .where(and(eq(garments.shopId, shopId), inArray(garments.status, NOT_READY), lt(garments.dueOn, today))),
    db
      .select({ step: garments.status, n })
      .from(garments)
      .where(and(eq(garments.shopId, shopId), ne(garments.status, 'collected')))
      .groupBy(garments.status),
    db
      .select({ b: bucket(payments.at), method: payments.method, sum: sql<number>`sum(${payments.amountMinor})`.mapWith(Number), n })
      .from(payments)
      // A payment from kept credit brings no money in: it was taken when the credit was.
      .where(and(eq(payments.shopId, shopId), ne(payments.method, 'credit'), gte(payments.at, start), lt(payments.at, end)))
      .groupBy(sql`1`, payments.method),
    // Money given back (done; a pending online refund has not left yet), out of the takings of its
    // method on the day it went; a credit kept for the customer is still in the till.
    db
      .select({ b: bucket(refunds.at), method: refunds.method, sum: sql<number>`sum(${refunds.amountMinor})`.mapWith(Number) })
      .from(refunds)
      .where(and(eq(refunds.shopId, shopId), eq(refunds.status, 'done'), ne(refunds.method, 'credit'), gte(refunds.at, start), lt(refunds.at, end)))
      .groupBy(sql`1`, refunds.method),
    readyTimes(shopId, moved('ready')),
  ]);

  const perDay: OverviewDay[] = days.map((day) => ({ day, takenIn: 0, handedOver: 0, dueDone: 0, dueOpen: 0, overdue: 0, takings: {} }));
  // The queries kept only moments inside the period, so every bucket is 1 … n.
  const at = (b: number) => perDay[b - 1]!;
  for (const r of takenIn) at(r.b).takenIn += r.n;
  for (const r of [...movedOut, ...pickedUp]) at(r.b).handedOver += r.n;
  for (const r of takings) at(r.b).takings[r.method] = (at(r.b).takings[r.method] ?? 0) + r.sum;
  for (const r of givenBack) at(r.b).takings[r.method] = (at(r.b).takings[r.method] ?? 0) - r.sum;
  for (const r of due) {
    const d = perDay.find((p) => p.day === r.day);
    if (!d) continue;
    d.dueDone += r.done;
    if (r.day! < today) d.overdue += r.open;
    else d.dueOpen += r.open;
  }
  const methods = new Map<string, { amountMinor: number; payments: number; refundedMinor: number }>();
  const method = (name: string) => methods.get(name) ?? methods.set(name, { amountMinor: 0, payments: 0, refundedMinor: 0 }).get(name)!;
  for (const r of takings) Object.assign(method(r.method), { amountMinor: method(r.method).amountMinor + r.sum, payments: method(r.method).payments + r.n });
  for (const r of givenBack)
    Object.assign(method(r.method), { amountMinor: method(r.method).amountMinor - r.sum, refundedMinor: method(r.method).refundedMinor + r.sum });
  const renames = bench.stepLabels;
  return {
    period,
    timeZone,
    currency,
    today,
    days: perDay,
    overdueBefore: before[0]?.n ?? 0,
    overdueNow: overdueNow[0]?.n ?? 0,
    waiting: GARMENT_STEPS.filter((s) => s !== 'collected').map((step) => ({
      step,
      label: stepLabel(step, renames),
      garments: waiting.find((w) => w.step === step)?.n ?? 0,
    })),
    takings: [...methods].map(([method, m]) => ({ method, ...m })).sort((a, b) => b.amountMinor - a.amountMinor || a.method.localeCompare(b.method)),
    intakeToReady: ready,
  };
}

/** Garments that became ready in the period (their last move to ready counts) and their average days since intake. */
async function readyTimes(shopId: string, readyInPeriod: SQL | undefined): Promise<Overview['intakeToReady']> {
  const last = db
    .select({ subject: auditEvents.subject, at: sql<Date>`max(${auditEvents.at})`.as('ready_at') })
    .from(auditEvents)
    .where(readyInPeriod)
    .groupBy(auditEvents.subject)
    .as('last_ready');
  const [row] = await db
    .select({
      n: count(),
      seconds: sql<number | null>`avg(extract(epoch from (${last.at} - ${garments.createdAt})))`.mapWith((v) => (v === null ? null : Number(v))),
    })
    .from(last)
    .innerJoin(garments, and(eq(garments.shopId, shopId), sql`${garments.id}::text = ${last.subject}`));
  const seconds = row?.seconds ?? null;
  return { garments: row?.n ?? 0, averageDays: seconds === null || !row?.n ? null : Math.round((seconds / DAY_SECONDS) * 10) / 10 };
}

/** The shop's counter currency (EUR before the counter settings were saved, as the counter reads it). */
async function shopCurrency(shopId: string): Promise<Currency> {
  const [row] = await db.select({ currency: counterSettings.currency }).from(counterSettings).where(eq(counterSettings.shopId, shopId));
  return row && isCurrency(row.currency) ? row.currency : 'EUR';
}
