// Closing a ticket's open online payment links, when what they ask for is no longer what is due.
import { and, eq } from 'drizzle-orm';
import { db } from '@/db';
import { paymentLinks } from '@/db/schema';
import { paymentClient } from '@/lib/payment-service';

/** Expires the ticket's open links at the payment service and marks them expired. */
export async function expireOpenLinks(ticketId: string): Promise<void> {
  const open = await db.select().from(paymentLinks).where(and(eq(paymentLinks.ticketId, ticketId), eq(paymentLinks.status, 'open')));
  if (open.length === 0) return;
  const client = paymentClient();
  for (const link of open) {
    try {
      await client?.checkout.sessions.expire(link.sessionId);
    } catch (e) {
      console.warn(`Could not expire payment session ${link.sessionId}: ${(e as Error).message}`);
    }
    await db.update(paymentLinks).set({ status: 'expired' }).where(eq(paymentLinks.id, link.id));
  }
}
