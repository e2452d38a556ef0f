// Closing a ticket's open online payment links, when what they ask for is no longer what is due.
import { and, eq } from 'drizzle-orm';
import type { Db } from '@/db';
import { paymentLinks } from '@/db/schema';
import { paymentClient } from '@/lib/payment-service';

/** Expires the ticket's open links at the payment service and marks them expired; call it inside
 * the ticket's lock (`withTicketLock`) with its transaction. */
export async function expireOpenLinks(tx: Db, ticketId: string): Promise<void> {
  const open = await tx.select().from(paymentLinks).where(and(eq(paymentLinks.ticketId, ticketId), eq(paymentLinks.status, 'open')));
  if (open.length === 0) return;
  const client = paymentClient();
  for (const link of open) {
    try {
      await client?.checkout.sessions.expire(link.sessionId);
    } catch (e) {
      console.warn(`Could not expire payment session ${link.sessionId}: ${(e as Error).message}`);
    }
    await tx.update(paymentLinks).set({ status: 'expired' }).where(eq(paymentLinks.id, link.id));
  }
}
