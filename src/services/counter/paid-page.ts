// What the public /paid page may say after an online payment: only what its checkout session
// proves. The session id comes back in the return address (the payment service fills it in); it
// is the pay link's own secret, so its holder learns the ticket number and amount the hosted pay
// page showed them already, and nothing else: no name, no other ticket (the number is written as
// the shop's ticket book writes it, with its initials, as on the claim slip).
import { and, eq } from 'drizzle-orm';
import { db } from '@/db';
import { organization, paymentLinks, payments, tickets } from '@/db/schema';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { isCurrency, type Currency } from '@/lib/pricing/money';

/** A payment session as the customer may see it: paid (recorded by the webhook) or still being confirmed. */
export interface PaidSession {
  state: 'paid' | 'confirming';
  ticket: string;
  amountMinor: number;
  currency: Currency;
}

// The service's session ids: a prefix and letters, digits or underscores (never a path, never huge).
const SESSION_ID = /^cs_[A-Za-z0-9_]{8,200}$/;

/** The ticket number and amount of a known checkout session; null for anything unknown or malformed. */
export async function paidSession(sessionId: string | null): Promise<PaidSession | null> {
  if (!sessionId || !SESSION_ID.test(sessionId)) return null;
  const [link] = await db
    .select({
      shopId: paymentLinks.shopId,
      ticketId: paymentLinks.ticketId,
      status: paymentLinks.status,
      amountMinor: paymentLinks.amountMinor,
      currency: paymentLinks.currency,
      number: tickets.number,
      shopName: organization.name,
    })
    .from(paymentLinks)
    .innerJoin(tickets, and(eq(tickets.id, paymentLinks.ticketId), eq(tickets.shopId, paymentLinks.shopId)))
    .innerJoin(organization, eq(organization.id, paymentLinks.shopId))
    .where(eq(paymentLinks.sessionId, sessionId));
  if (!link || !isCurrency(link.currency)) return null;
  const [paid] = await db
    .select({ amountMinor: payments.amountMinor })
    .from(payments)
    .where(and(eq(payments.shopId, link.shopId), eq(payments.ticketId, link.ticketId), eq(payments.method, 'online'), eq(payments.reference, sessionId)));
  if (paid) return { state: 'paid', ticket: ticketLabel(link.number, link.shopName), amountMinor: paid.amountMinor, currency: link.currency };
  // Not recorded yet: the service's webhook may still be on its way; a closed link shows nothing.
  if (link.status !== 'open' && link.status !== 'expiring') return null;
  return { state: 'confirming', ticket: ticketLabel(link.number, link.shopName), amountMinor: link.amountMinor, currency: link.currency };
}
