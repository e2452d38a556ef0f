// The demo shop's past few days, so its overview has something to show: each demo garment taken in
// some days ago (further back the further along it is), its moves along the bench recorded on the
// way, and two tickets' money (the collected linen pair paid by card and cash, a cash deposit on
// the chinos). Every figure is invented.
import { and, asc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, garments, payments, priceLines, tickets } from '@/db/schema';
import { GARMENT_STEPS, type GarmentStep } from '@/lib/shared/garment-steps';
import type { Role } from '@/lib/shared/roles';

const DAY = 86_400_000;
// How many days ago a garment at each step came in.
const DAYS_AGO: Record<GarmentStep, number> = { received: 0, marked: 1, cut: 2, stitched: 3, pressed: 4, ready: 5, collected: 9 };
const PLAIN_HEM = 1650; // the demo price list's plain hem, in cents (demo-counter-seed.ts)

/** Backdates the demo garments' intake, records their moves and adds two tickets' payments. */
export async function seedOverviewDemo(shopId: string, people: Partial<Record<Role, string>>, now = new Date()): Promise<void> {
  const rows = await db
    .select({ id: garments.id, status: garments.status, ticketId: garments.ticketId, number: tickets.number, description: garments.description })
    .from(garments)
    .innerJoin(tickets, eq(tickets.id, garments.ticketId))
    .where(eq(garments.shopId, shopId))
    .orderBy(asc(tickets.number), asc(garments.position));
  const lastMove = new Map<string, Date>();
  const intakeOf = new Map<string, Date>();
  for (const g of rows) {
    const intake = new Date(now.getTime() - DAYS_AGO[g.status] * DAY);
    await db
      .update(garments)
      .set({ createdAt: intake })
      .where(and(eq(garments.id, g.id), eq(garments.shopId, shopId)));
    const first = intakeOf.get(g.ticketId);
    if (!first || intake < first) intakeOf.set(g.ticketId, intake);
    // The moves spread between intake and two hours ago, one step at a time.
    const steps = GARMENT_STEPS.slice(1, GARMENT_STEPS.indexOf(g.status) + 1);
    const span = now.getTime() - 2 * 3_600_000 - intake.getTime();
    const moves = steps.map((to, k) => ({
      shopId,
      actorId: (to === 'collected' ? people.counter : people.tailor) ?? null,
      action: 'garment.moved',
      subject: g.id,
      detail: { from: GARMENT_STEPS[k]!, to },
      at: new Date(intake.getTime() + (span * (k + 1)) / (steps.length + 0.5)),
    }));
    if (moves.length) await db.insert(auditEvents).values(moves);
    if (moves.length) lastMove.set(g.ticketId, moves[moves.length - 1]!.at);
  }
  for (const [ticketId, at] of intakeOf)
    await db
      .update(tickets)
      .set({ createdAt: at })
      .where(and(eq(tickets.id, ticketId), eq(tickets.shopId, shopId)));

  const linen = rows.find((g) => g.status === 'collected');
  const chinos = rows.filter((g) => g.description?.endsWith('chinos'));
  if (linen) {
    const paidAt = intakeOf.get(linen.ticketId)!;
    await priced(shopId, linen.ticketId, [linen.id], people, paidAt);
    await paid(shopId, linen.ticketId, 'deposit', 'card', 1000, paidAt, people);
    await paid(shopId, linen.ticketId, 'balance', 'cash', PLAIN_HEM - 1000, lastMove.get(linen.ticketId) ?? now, people);
  }
  if (chinos.length) {
    const at = intakeOf.get(chinos[0]!.ticketId)!;
    await priced(
      shopId,
      chinos[0]!.ticketId,
      chinos.map((g) => g.id),
      people,
      at,
    );
    await paid(shopId, chinos[0]!.ticketId, 'deposit', 'cash', 1500, at, people);
  }
}

async function priced(shopId: string, ticketId: string, garmentIds: string[], people: Partial<Record<Role, string>>, at: Date) {
  await db.insert(priceLines).values(
    garmentIds.map((garmentId) => ({
      shopId,
      ticketId,
      garmentId,
      key: 'plain-hem' as const,
      source: 'list' as const,
      label: 'Plain hem',
      amountMinor: PLAIN_HEM,
      createdById: people.counter,
      createdAt: at,
    })),
  );
  await db.insert(auditEvents).values({
    shopId,
    actorId: people.counter ?? null,
    action: 'prices.line-added',
    subject: ticketId,
    detail: { amountMinor: PLAIN_HEM * garmentIds.length },
    at,
  });
}

async function paid(
  shopId: string,
  ticketId: string,
  purpose: 'deposit' | 'balance',
  method: 'cash' | 'card',
  amountMinor: number,
  at: Date,
  people: Partial<Record<Role, string>>,
) {
  await db.insert(payments).values({ shopId, ticketId, purpose, method, amountMinor, currency: 'EUR', takenById: people.counter, at });
  await db
    .insert(auditEvents)
    .values({ shopId, actorId: people.counter ?? null, action: `payment.${purpose}`, subject: ticketId, detail: { method, amountMinor }, at });
}
