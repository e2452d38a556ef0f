// Writes and reads audit events: who changed what in a shop, and when.
import { and, desc, eq, inArray } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { auditEvents, user } from '@/db/schema';
import type { AuditEntry } from '@/lib/shared/bench-types';

// Each event is written by the transaction of the change it records (`tx`): both are kept or
// neither, so a change never stands without its history, and a refused event (text PostgreSQL
// cannot keep) undoes the change instead of answering 500 after it was written.

/** Records one event for the shop, inside the change's own transaction. */
export async function audit(tx: Db, shopId: string, actorId: string | null, action: string, subject?: string, detail: Record<string, unknown> = {}) {
  await tx.insert(auditEvents).values({ shopId, actorId, action, subject, detail });
}

/** Records several events at once (one change of many fields), inside the change's transaction. */
export async function auditMany(tx: Db, rows: { shopId: string; actorId: string | null; action: string; subject: string; detail: Record<string, unknown> }[]) {
  if (rows.length) await tx.insert(auditEvents).values(rows);
}

/** The shop's events about some subjects (e.g. a garment), newest first, with who did them. */
export async function auditOf(shopId: string, subjects: string[], actions?: string[]): Promise<AuditEntry[]> {
  const rows = await db
    .select({ id: auditEvents.id, at: auditEvents.at, actorName: user.name, action: auditEvents.action, detail: auditEvents.detail })
    .from(auditEvents)
    .leftJoin(user, eq(user.id, auditEvents.actorId))
    .where(and(eq(auditEvents.shopId, shopId), inArray(auditEvents.subject, subjects), actions ? inArray(auditEvents.action, actions) : undefined))
    .orderBy(desc(auditEvents.at), desc(auditEvents.id));
  return rows.map((r) => ({ ...r, at: r.at.toISOString(), detail: r.detail as Record<string, unknown> }));
}
