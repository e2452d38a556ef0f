// Receipts after a payment: the data of one payment's receipt (the ticket's account as it stands),
// its PDF, and the same PDF e-mailed to the customer and recorded in sent_mail.
import { db } from '@/db';
import { organization } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { dateTimeText } from '@/lib/shared/date-text';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { sendMail } from '@/lib/server/mail';
import { formatMoney } from '@/lib/pricing/money';
import { renderReceipt } from '@/lib/server/receipt/render';
import type { ReceiptData } from '@/lib/server/receipt/types';
import { eq } from 'drizzle-orm';
import { audit } from '../audit';
import { ServiceError } from '../errors';
import { shopTimeZone } from '../shop-time-zone';
import { isUuid, shopTicket } from '../ticket-core';
import { counterSettingsOf } from './prices';
import { summaryOf, type CounterSummary } from './summary';

/** How a payment was made, in the receipt's words. */
export const PAID_HOW = { cash: 'cash', card: 'card at the counter', online: 'online payment', credit: 'credit kept from before' } as const;
const GIVEN_BACK = { cash: 'Cash given back', card: 'Refunded to card', online: 'Refunded online', credit: 'Kept as credit' } as const;

/** The ticket's summary and the payment of it a receipt is asked for; 404 for another shop's or a wrong id. */
async function paymentOf(actor: Pick<Actor, 'shopId'>, ticketId: string, paymentId: string) {
  const ticket = await shopTicket(actor, ticketId);
  const summary = await summaryOf(ticket, await counterSettingsOf(actor.shopId));
  const payment = isUuid(paymentId) ? summary.payments.find((p) => p.id === paymentId) : undefined;
  if (!payment) throw new ServiceError(404, 'No such payment on this ticket.');
  return { summary, payment };
}

function receiptOf(
  shop: { name: string; location: string; hours: string; timeZone: string },
  summary: CounterSummary,
  payment: CounterSummary['payments'][number],
  now: Date,
): ReceiptData {
  // Printed on the server: every moment in the shop's zone, not the server's.
  const when = (at: Date) => dateTimeText(at, shop.timeZone);
  return {
    shopName: shop.name,
    location: shop.location,
    hours: shop.hours,
    ticketNumber: ticketLabel(summary.ticket.number, shop.name),
    customerName: summary.ticket.customerName,
    printedAt: when(now),
    payment: { how: PAID_HOW[payment.method], at: when(payment.at), amountMinor: payment.amountMinor, takenBy: payment.takenByName },
    lines: summary.lines.filter((l) => !l.voidedAt).map((l) => ({ label: l.reason ? `${l.label} (${l.reason})` : l.label, amountMinor: l.amountMinor })),
    currency: summary.currency,
    total: summary.total,
    payments: summary.payments.map((p) => ({ how: PAID_HOW[p.method], at: when(p.at), amountMinor: p.amountMinor })),
    // A failed refund gave nothing back; a pending one counts, as in the balance.
    refunds: summary.refunds
      .filter((r) => r.status !== 'failed')
      .map((r) => ({
        how: r.status === 'pending' ? `${GIVEN_BACK[r.method]} (on its way)` : GIVEN_BACK[r.method],
        at: when(r.at),
        amountMinor: r.amountMinor,
      })),
    paid: summary.paid,
    refunded: summary.refunded,
    due: summary.due,
    credit: summary.credit,
  };
}

/** The receipt of one payment of a ticket of the actor's shop. */
export async function receiptData(actor: Pick<Actor, 'shopId' | 'shopName'>, ticketId: string, paymentId: string, now = new Date()): Promise<ReceiptData> {
  const { summary, payment } = await paymentOf(actor, ticketId, paymentId);
  const settings = await counterSettingsOf(actor.shopId);
  const [shop] = await db.select({ name: organization.name }).from(organization).where(eq(organization.id, actor.shopId));
  const { timeZone } = await shopTimeZone(actor.shopId);
  return receiptOf({ name: shop?.name ?? actor.shopName, location: settings.location, hours: settings.hours, timeZone }, summary, payment, now);
}

/** The receipt as PDF bytes with its file name. */
export async function receiptPdf(
  actor: Pick<Actor, 'shopId' | 'shopName'>,
  ticketId: string,
  paymentId: string,
): Promise<{ pdf: Uint8Array<ArrayBuffer>; fileName: string }> {
  const data = await receiptData(actor, ticketId, paymentId);
  const { number } = await shopTicket(actor, ticketId);
  // The file name keeps to the digits: a header cannot carry the initials of every script.
  return { pdf: await renderReceipt(data), fileName: `receipt-${number}.pdf` };
}

/** E-mails a payment's receipt (PDF attached) to the ticket's customer; refused without an address. */
export async function emailReceipt(actor: Actor, ticketId: string, paymentId: string): Promise<{ to: string }> {
  const { summary, payment } = await paymentOf(actor, ticketId, paymentId);
  const to = summary.ticket.customerEmail;
  if (!to) throw new ServiceError(422, 'The customer has no e-mail address: add one, or print the receipt.');
  const data = await receiptData(actor, ticketId, paymentId);
  const pdf = await renderReceipt(data);
  const amount = formatMoney(payment.amountMinor, summary.currency);
  const text = [
    `${`Hello ${summary.ticket.customerName ?? ''}`.trim()},`,
    '',
    `Thank you: ${data.shopName} received ${amount} (${data.payment.how}, ${data.payment.at}) for ticket ${data.ticketNumber}.`,
    summary.due > 0
      ? `Balance still due: ${formatMoney(summary.due, summary.currency)}.`
      : summary.credit > 0
        ? `We owe you ${formatMoney(summary.credit, summary.currency)}.`
        : 'Nothing is left to pay.',
    '',
    'Your receipt is attached.',
  ].join('\n');
  await sendMail(
    {
      to,
      subject: `Receipt for ticket ${data.ticketNumber}: ${amount}`,
      text,
      attachments: [{ filename: `receipt-${summary.ticket.number}.pdf`, content: Buffer.from(pdf), contentType: 'application/pdf' }],
    },
    { shopId: actor.shopId, kind: 'receipt' },
  );
  await audit(db, actor.shopId, actor.userId, 'receipt.emailed', ticketId, { paymentId });
  return { to };
}
