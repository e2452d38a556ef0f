// Writes and reads audit events: who changed what in a shop, and when.
import { and, desc, eq, inArray } from 'drizzle-orm';
import { db } from '@/db';
import { auditEvents, user } from '@/db/schema';
import type { AuditEntry } from '@/lib/bench-types';

/** Records one event for the shop. */
export async function audit(shopId: string, actorId: string | null, action: string, subject?: string, detail: Record<string, unknown> = {}) {
  await db.insert(auditEvents).values({ shopId, actorId, action, subject, detail });
}

/** Records several events at once (one change of many fields). */
export async function auditMany(rows: { shopId: string; actorId: string | null; action: string; subject: string; detail: Record<string, unknown> }[]) {
  if (rows.length) await db.insert(auditEvents).values(rows);
}

/** The shop's events about some subjects (e.g. a garment), newest first, with who did them. */
export async function auditOf(shopId: string, subjects: string[], actions?: string[]): Promise<AuditEntry[]> {
  const rows = await db
    .select({ id: auditEvents.id, at: auditEvents.at, actorName: user.name, action: auditEvents.action, detail: auditEvents.detail })
    .from(auditEvents)
    .leftJoin(user, eq(user.id, auditEvents.actorId))
    .where(
      and(
        eq(auditEvents.shopId, shopId),
        inArray(auditEvents.subject, subjects),
        actions ? inArray(auditEvents.action, actions) : undefined,
      ),
    )
    .orderBy(desc(auditEvents.at), desc(auditEvents.id));
  return rows.map((r) => ({ ...r, at: r.at.toISOString(), detail: r.detail as Record<string, unknown> }));
}
