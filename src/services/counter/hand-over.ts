// Handing the trousers over: the one rule every path to "collected" checks (ready, priced or
// marked "no charge" with a reason, nothing due), and the counter's pickup, which closes the
// ticket and every ready garment. A credit owed to the customer does not hold the hand-over up:
// it stays on the ticket until it is settled (refunds.ts).
import { and, eq } from 'drizzle-orm';
import type { Db } from '@/db';
import { garments, type Ticket } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { audit } from '../audit';
import { ServiceError } from '../errors';
import { moveGarmentsLocked, tellMoved } from '../garment-moves';
import { withTicketLock } from '../ticket-core';
import { counterSettingsOf } from './prices';
import { counterSummary, summaryOf, type CounterSummary } from './summary';

/** The refusal when the ticket cannot be handed over (not ready, no price, or money due), else null. */
function handOverRefusal(summary: CounterSummary): ServiceError | null {
  if (summary.ticket.status !== 'ready') return new ServiceError(422, `Only a ready ticket can be handed over (this one is ${summary.ticket.status}).`);
  if (!summary.lines.some((l) => !l.voidedAt)) {
    return new ServiceError(422, 'This ticket has no price: price the work, or mark it "no charge" with a reason, before handing it over.');
  }
  if (summary.due > 0) return new ServiceError(422, 'Take the balance before handing the trousers over.');
  return null;
}

/** Throws 422 unless the ticket is ready and nothing is due: the check any path to "collected"
 * needs, made inside the ticket's lock (`withTicketLock`, its transaction and locked row) so it
 * still holds when the move commits. */
export async function assertReadyToHandOver(tx: Db, ticket: Ticket): Promise<CounterSummary> {
  const summary = await summaryOf(ticket, await counterSettingsOf(ticket.shopId, tx), tx);
  const refusal = handOverRefusal(summary);
  if (refusal) throw refusal;
  return summary;
}

/** Hands a ready, fully paid ticket over: every garment and the ticket become collected. */
export async function pickUp(actor: Actor, ticketId: string): Promise<CounterSummary> {
  // Checked and written under the ticket's lock: a price line or payment arriving meanwhile waits,
  // and one that came first is in the balance checked here.
  const moved = await withTicketLock(actor.shopId, ticketId, async (tx, ticket) => {
    const summary = await assertReadyToHandOver(tx, ticket);
    const ready = await tx
      .select({ id: garments.id })
      .from(garments)
      .where(and(eq(garments.ticketId, ticketId), eq(garments.shopId, actor.shopId), eq(garments.status, 'ready')));
    // The same move as a garment handed over on its own: recorded per garment, listeners told.
    const rows = await moveGarmentsLocked(
      tx,
      actor,
      ticketId,
      ready.map((g) => g.id),
      'ready',
      'collected',
    );
    await audit(tx, actor.shopId, actor.userId, 'ticket.collected', ticketId, {
      total: summary.total,
      paid: summary.paid,
      refunded: summary.refunded,
      credit: summary.credit,
    });
    return rows;
  });
  await tellMoved(actor, moved);
  return counterSummary(actor, ticketId);
}
