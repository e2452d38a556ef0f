// Settles the credit owed to the customer on a ticket: cash back, card terminal, kept as credit,
// or a refund of an online payment through the payment service.
import { route } from '@/lib/server/route';
import { refundInput } from '@/lib/shared/counter-request';
import { settleCredit } from '@/services/counter/refunds';
import { counterSummaryJson } from '@/lib/server/answers/counter';

export const prerender = false;

/** Records the refund (an online one is confirmed by the service); answers the ticket's money. */
export const POST = route(
  {
    summary: "Settles the credit owed to the customer (cash, card, online or kept as credit); answers the ticket's money.",
    permission: ['payments', 'take'],
    body: refundInput,
    status: 201,
    examples: [{ summary: '1.00 back in cash', body: { method: 'cash', amountMinor: 100 } }],
    responses: { 201: counterSummaryJson },
  },
  ({ actor, params, body }) => settleCredit(actor, params.id!, body),
);
