// The shop's rule for a garment passing Chalk-marked with no fitting saved, checked on every way a
// garment moves on (moveGarmentsLocked: one garment, a whole ticket) under the ticket's lock.
import { and, eq, inArray } from 'drizzle-orm';
import type { Db } from '@/db';
import { garments, kindFittings, measurements, shopSettings } from '@/db/schema';
import { DEFAULT_FITTING_RULE, noFittingRefusal, passesMarked, type FittingRule } from '@/lib/shared/fitting-rule';
import { stepLabel, type GarmentStep } from '@/lib/shared/garment-steps';
import { canBePlanned } from '@/lib/server/fitting/saved-leg';
import type { SavedLeg } from '@/lib/shared/measurement-request';
import { ServiceError } from './errors';

type SavedForPlan = Pick<SavedLeg, 'finish' | 'preset' | 'values' | 'unit'>;

/** True when a saved fitting can be cut by: legs saved and each has a plan (what its cut sheet needs). */
export function isFitted(legs: readonly SavedForPlan[]): boolean {
  return legs.length > 0 && legs.every((l) => canBePlanned(l));
}

/** The ids among `garmentIds` whose fitting is saved and can be cut by (one query). */
export async function fittedGarments(q: Db, garmentIds: string[]): Promise<Set<string>> {
  if (garmentIds.length === 0) return new Set();
  const rows = await q
    .select({
      garmentId: measurements.garmentId,
      finish: measurements.finish,
      preset: measurements.preset,
      values: measurements.values,
      unit: measurements.unit,
    })
    .from(measurements)
    .where(inArray(measurements.garmentId, garmentIds));
  const byGarment = new Map<string, SavedForPlan[]>();
  for (const { garmentId, ...leg } of rows) byGarment.set(garmentId, [...(byGarment.get(garmentId) ?? []), leg as SavedForPlan]);
  const fitted = new Set([...byGarment].filter(([, legs]) => isFitted(legs)).map(([id]) => id));
  // A garment fitted once (a skirt): its saved fitting passed its engine on save, so it can be cut by.
  const whole = await q.select({ garmentId: kindFittings.garmentId }).from(kindFittings).where(inArray(kindFittings.garmentId, garmentIds));
  for (const { garmentId } of whole) fitted.add(garmentId);
  return fitted;
}

/** The shop's rule, read through `q` (inside a lock, its transaction). */
export async function fittingRuleOf(q: Db, shopId: string): Promise<FittingRule> {
  const [row] = await q.select({ rule: shopSettings.fittingRule }).from(shopSettings).where(eq(shopSettings.shopId, shopId));
  return row?.rule ?? DEFAULT_FITTING_RULE;
}

/**
 * Refuses (409) a move past Chalk-marked of any garment without a fitting when the shop's rule is
 * 'refuse'; with 'warn' the screens ask first and the move goes through. Call under the ticket's lock.
 */
export async function assertFittingRule(tx: Db, shopId: string, ids: string[], from: GarmentStep, to: GarmentStep): Promise<void> {
  if (!passesMarked(from, to) || ids.length === 0) return;
  if ((await fittingRuleOf(tx, shopId)) !== 'refuse') return;
  const fitted = await fittedGarments(tx, ids);
  const missing = ids.filter((id) => !fitted.has(id));
  if (missing.length === 0) return;
  const [first] = await tx
    .select({ description: garments.description })
    .from(garments)
    .where(and(eq(garments.shopId, shopId), eq(garments.id, missing[0]!)));
  const what = missing.length === 1 ? `“${first?.description ?? 'Trousers'}”` : `${missing.length} of these garments`;
  throw new ServiceError(409, noFittingRefusal(what, stepLabel(to)));
}
