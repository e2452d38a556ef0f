// The shop's time zone: where its days begin and end for the overview (and any day-by-day figure).
import { eq } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { shopSettings } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { DEFAULT_TIME_ZONE, isTimeZone } from '@/lib/shared/overview/shop-days';
import { audit } from './audit';
import { ServiceError } from './errors';

/** The shop's time zone and whether the shop chose it (otherwise it is the default). */
export interface ShopTimeZone {
  timeZone: string;
  chosen: boolean;
}

/** The shop's IANA time zone, or DEFAULT_TIME_ZONE before one was chosen (or if Intl no longer knows it). */
export async function shopTimeZone(shopId: string, q: Db = db): Promise<ShopTimeZone> {
  const [row] = await q.select({ timeZone: shopSettings.timeZone }).from(shopSettings).where(eq(shopSettings.shopId, shopId));
  return row?.timeZone && isTimeZone(row.timeZone) ? { timeZone: row.timeZone, chosen: true } : { timeZone: DEFAULT_TIME_ZONE, chosen: false };
}

/** Saves the shop's time zone (checked with Intl: 422 for a name it does not know). */
export async function saveShopTimeZone(actor: Actor, timeZone: string): Promise<ShopTimeZone> {
  if (!isTimeZone(timeZone)) throw new ServiceError(422, `"${timeZone}" is not a time zone this server knows: choose one like Europe/London.`);
  await db.transaction(async (tx) => {
    const before = await shopTimeZone(actor.shopId, tx);
    await tx
      .insert(shopSettings)
      .values({ shopId: actor.shopId, timeZone, updatedAt: new Date() })
      .onConflictDoUpdate({ target: shopSettings.shopId, set: { timeZone, updatedAt: new Date() } });
    await audit(tx, actor.shopId, actor.userId, 'settings.time-zone', actor.shopId, { old: before.chosen ? before.timeZone : null, new: timeZone });
  });
  return shopTimeZone(actor.shopId);
}
