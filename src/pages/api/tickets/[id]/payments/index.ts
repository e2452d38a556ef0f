// A ticket's money at the counter: the summary (lines, total, payments, balance) and taking a payment.
import { route } from '@/lib/server/route';
import { paymentInput } from '@/lib/shared/counter-request';
import { smsConfigured } from '@/lib/server/sms-service';
import { counterSummary, takePayment } from '@/services/counter/payments';
import { counterSummaryJson } from '@/lib/server/answers/counter';

export const prerender = false;

/** Lines, total, payments, balance due and the payment link, and whether texts are set up. */
export const GET = route(
  {
    summary: "The ticket's money: lines, total, payments, balance due, the payment link, and whether texts are set up.",
    permission: ['prices', 'read'],
    responses: { 200: counterSummaryJson },
  },
  async ({ actor, params }) => ({ ...(await counterSummary(actor, params.id!)), textsReady: smsConfigured() }),
);

/** Takes a deposit or the balance in cash or by card. */
export const POST = route(
  {
    summary: 'Takes a deposit or the balance in cash or by card (amounts in minor units: cents).',
    permission: ['payments', 'take'],
    body: paymentInput,
    status: 201,
    examples: [{ summary: 'A 10.00 deposit in cash', body: { method: 'cash', amountMinor: 1000 } }],
    responses: { 201: counterSummaryJson },
  },
  ({ actor, params, body }) => takePayment(actor, params.id!, body),
);
