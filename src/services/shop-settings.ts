// A shop's bench settings: the measuring scale and its own names for the bench steps.
import { eq } from 'drizzle-orm';
import type { z } from 'zod';
import { db } from '@/db';
import { shopSettings } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { settingsRequest } from '@/lib/shared/bench-requests';
import type { BenchSettings } from '@/lib/shared/bench-types';
import { DEFAULT_FITTING_RULE } from '@/lib/shared/fitting-rule';
import { DEFAULT_WAIST_ORDER } from '@/lib/shared/waist-order';
import { DEFAULT_LANGUAGE } from '@/lib/shared/i18n/languages';
import { audit } from './audit';

/** The shop's settings, or the defaults (inches to 1/8, the usual step names, warn) before any were saved. */
export async function benchSettings(shopId: string): Promise<BenchSettings> {
  const [row] = await db.select().from(shopSettings).where(eq(shopSettings.shopId, shopId));
  return {
    scale: row?.scale ?? 'in8',
    stepLabels: (row?.stepLabels as BenchSettings['stepLabels']) ?? {},
    fittingRule: row?.fittingRule ?? DEFAULT_FITTING_RULE,
    waistOrder: row?.waistOrder ?? DEFAULT_WAIST_ORDER,
    language: row?.language ?? DEFAULT_LANGUAGE,
  };
}

/** Saves the shop's settings. */
export async function saveBenchSettings(actor: Actor, input: z.output<typeof settingsRequest>): Promise<BenchSettings> {
  const values = {
    scale: input.scale,
    stepLabels: input.stepLabels,
    ...(input.fittingRule ? { fittingRule: input.fittingRule } : {}),
    ...(input.waistOrder ? { waistOrder: input.waistOrder } : {}),
    ...(input.language ? { language: input.language } : {}),
    updatedAt: new Date(),
  };
  await db.transaction(async (tx) => {
    await tx
      .insert(shopSettings)
      .values({ shopId: actor.shopId, ...values })
      .onConflictDoUpdate({ target: shopSettings.shopId, set: values });
    await audit(tx, actor.shopId, actor.userId, 'settings.bench', actor.shopId, values);
  });
  return benchSettings(actor.shopId);
}
