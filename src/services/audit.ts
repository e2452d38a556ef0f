// Writes audit events: who changed what in a shop.
import { db } from '@/db';
import { auditEvents } from '@/db/schema';

/** Records one event for the shop. */
export async function audit(shopId: string, actorId: string | null, action: string, subject?: string, detail: Record<string, unknown> = {}) {
  await db.insert(auditEvents).values({ shopId, actorId, action, subject, detail });
}
