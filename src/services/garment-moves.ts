// The one path every garment move takes (a step on the bench, a whole ticket, the counter's
// hand-over): the rows change only if they still stand where they were read, the ticket's status
// follows its least advanced garment, each move is recorded as `garment.moved`, and the listeners
// hear of it after the transaction commits.
import { and, eq, inArray } from 'drizzle-orm';
import type { Db } from '@/db';
import { garments, tickets, type Garment } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { leastAdvanced, type GarmentStep } from '@/lib/shared/garment-steps';
import { auditMany } from './audit';
import { ServiceError } from './errors';
import { onGarmentMoved } from './garment-events';
import { assertFittingRule } from './fitting-rule';

/** Sets the ticket's status to its least advanced garment's step, inside the ticket's lock `tx`. */
export async function writeTicketStatus(tx: Db, shopId: string, ticketId: string): Promise<GarmentStep> {
  const steps = await tx
    .select({ status: garments.status })
    .from(garments)
    .where(and(eq(garments.shopId, shopId), eq(garments.ticketId, ticketId)));
  const status = leastAdvanced(steps.map((g) => g.status));
  await tx
    .update(tickets)
    .set({ status, updatedAt: new Date() })
    .where(and(eq(tickets.id, ticketId), eq(tickets.shopId, shopId)));
  return status;
}

/** Moves the ticket's garments `ids`, all standing at `from`, to `to` inside the ticket's lock
 * `tx`: 409 and nothing kept if any moved meanwhile; `back` marks a step back. Call `tellMoved`
 * with the rows after the transaction. */
export async function moveGarmentsLocked(
  tx: Db,
  actor: Actor,
  ticketId: string,
  ids: string[],
  from: GarmentStep,
  to: GarmentStep,
  back = false,
): Promise<Garment[]> {
  if (ids.length === 0) return [];
  // The shop may refuse cutting a garment with no fitting saved (a step back is never held up).
  if (!back) await assertFittingRule(tx, actor.shopId, ids, from, to);
  const rows = await tx
    .update(garments)
    .set({ status: to, updatedAt: new Date() })
    .where(and(eq(garments.shopId, actor.shopId), eq(garments.ticketId, ticketId), inArray(garments.id, ids), eq(garments.status, from)))
    .returning();
  if (rows.length !== ids.length) {
    throw new ServiceError(
      409,
      ids.length === 1
        ? 'Someone else moved this garment first: reload and try again.'
        : 'Someone else moved a garment of this ticket first: reload and try again.',
    );
  }
  await writeTicketStatus(tx, actor.shopId, ticketId);
  const detail = back ? { from, to, back: true } : { from, to };
  await auditMany(
    tx,
    rows.map((g) => ({ shopId: actor.shopId, actorId: actor.userId, action: 'garment.moved', subject: g.id, detail })),
  );
  return rows;
}

/** Tells the garment-moved listeners of each moved row, once the move has committed. */
export async function tellMoved(actor: Actor, rows: Garment[]): Promise<void> {
  for (const g of rows) await onGarmentMoved(actor, g);
}
