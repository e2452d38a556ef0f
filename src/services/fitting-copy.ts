// "Same as last time": a returning customer's earlier fittings, offered when a new garment is taken
// in, and copied into the new garment's fitting in one tap (each copied value audited like a typed one).
import { and, desc, eq, inArray } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { garments, measurements, presets, tickets } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { PreviousFitting } from '@/lib/shared/customer-types';
import { LEG_LENGTHS, type SavedLength } from '@/lib/shared/measurement-request';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { auditMany } from './audit';
import { ServiceError } from './errors';
import { isLegKind, kindOf } from '@/lib/shared/fitting/garment-kinds';
import { getCustomer } from './customers';

/** How many earlier fittings are offered per garment kind, newest first. */
export const FITTINGS_PER_KIND = 3;

/** The customer's latest fittings per garment kind (finished length, cuff depth, preset per leg). */
export async function previousFittings(actor: Actor, customerId: string): Promise<PreviousFitting[]> {
  const c = await getCustomer(actor, customerId);
  const rows = await db
    .select({ m: measurements, kind: garments.kind, description: garments.description, number: tickets.number, presetName: presets.name })
    .from(measurements)
    .innerJoin(garments, eq(garments.id, measurements.garmentId))
    .innerJoin(tickets, eq(tickets.id, garments.ticketId))
    // The preset's current name through its id, within this shop only.
    .leftJoin(presets, and(eq(presets.id, measurements.presetId), eq(presets.shopId, actor.shopId)))
    .where(and(eq(measurements.shopId, actor.shopId), eq(garments.shopId, actor.shopId), eq(tickets.shopId, actor.shopId), eq(tickets.customerId, c.id)))
    .orderBy(desc(measurements.takenAt), desc(tickets.number));
  const byGarment = new Map<string, PreviousFitting>();
  for (const { m, kind, description, number, presetName } of rows) {
    const values = m.values as Record<string, SavedLength | undefined>;
    const fitting = byGarment.get(m.garmentId) ?? {
      garmentId: m.garmentId,
      kind,
      description: description ?? 'Trousers',
      ticketNumber: number,
      ticketLabel: ticketLabel(number, actor.shopName),
      takenAt: m.takenAt.toISOString(),
      unit: m.unit,
      legs: [],
    };
    fitting.legs.push({
      leg: m.leg,
      finish: m.finish,
      preset: presetName ?? m.preset,
      finishedLength: values.backPin?.text ?? null,
      cuffDepth: values.cuffDepth?.text ?? null,
    });
    byGarment.set(m.garmentId, fitting);
  }
  const perKind = new Map<string, number>();
  return [...byGarment.values()]
    .filter((f) => {
      const n = (perKind.get(f.kind) ?? 0) + 1;
      perKind.set(f.kind, n);
      return n <= FITTINGS_PER_KIND;
    })
    .map((f) => ({ ...f, legs: f.legs.sort((a, b) => a.leg.localeCompare(b.leg)) }));
}

/**
 * Copies the fitting of `fromGarmentId` (a garment of the same customer in the same shop) into
 * each new garment, inside the intake's or the added garment's own transaction; 422 when the
 * source is not this customer's or has no fitting.
 */
export async function copyFittings(tx: Db, actor: Actor, customerId: string | null, pairs: { to: string; from: string }[]): Promise<void> {
  if (pairs.length === 0) return;
  if (!customerId) throw new ServiceError(422, 'Choose the customer before copying a fitting from last time.');
  // The copy is of trouser legs: a garment fitted once (a skirt) has no legs to take them.
  const targets = await tx
    .select({ kind: garments.kind })
    .from(garments)
    .where(
      and(
        inArray(
          garments.id,
          pairs.map((p) => p.to),
        ),
        eq(garments.shopId, actor.shopId),
      ),
    );
  if (targets.some((g) => !isLegKind(kindOf(g.kind))))
    throw new ServiceError(422, 'Only trousers take a fitting from last time: fit this garment on its own page.');
  const sources = [...new Set(pairs.map((p) => p.from))];
  const rows = await tx
    .select({ m: measurements, number: tickets.number, presetName: presets.name })
    .from(measurements)
    .innerJoin(garments, eq(garments.id, measurements.garmentId))
    .innerJoin(tickets, eq(tickets.id, garments.ticketId))
    .leftJoin(presets, and(eq(presets.id, measurements.presetId), eq(presets.shopId, actor.shopId)))
    .where(
      and(inArray(measurements.garmentId, sources), eq(garments.shopId, actor.shopId), eq(tickets.shopId, actor.shopId), eq(tickets.customerId, customerId)),
    );
  const events: Parameters<typeof auditMany>[1] = [];
  for (const { to, from } of pairs) {
    const legs = rows.filter((r) => r.m.garmentId === from);
    if (legs.length === 0) throw new ServiceError(422, "That fitting is not one of this customer's: choose one from the list.");
    for (const { m, number, presetName } of legs) {
      const values = m.values as Record<string, SavedLength | undefined>;
      // The copy points at the same preset (this shop's, by the join) under its current name.
      const preset = presetName ?? m.preset;
      const presetId = presetName === null ? null : m.presetId;
      await tx
        .insert(measurements)
        .values({ shopId: actor.shopId, garmentId: to, leg: m.leg, unit: m.unit, finish: m.finish, preset, presetId, values, takenById: actor.userId });
      const detail = (field: string, value: string | null) => ({
        leg: m.leg,
        field,
        old: null,
        new: value,
        unit: m.unit,
        copiedFrom: ticketLabel(number, actor.shopName),
      });
      const push = (field: string, value: string | null) =>
        value && events.push({ shopId: actor.shopId, actorId: actor.userId, action: 'measurement.changed', subject: to, detail: detail(field, value) });
      push('finish', m.finish);
      push('preset', preset);
      for (const field of LEG_LENGTHS) push(field, values[field]?.text ?? null);
    }
  }
  await auditMany(tx, events);
}
