// An online payment link for the balance due, made through the payment service.
import { route } from '@/lib/server/route';
import { createPaymentLink } from '@/services/counter/payments';
import { counterSummaryJson } from '@/lib/server/answers/counter';

export const prerender = false;

/** Makes (or reuses) the link; the summary carries its address. */
export const POST = route(
  {
    summary: 'Makes (or reuses) an online payment link for the balance due; the answer carries its address.',
    permission: ['payments', 'take'],
    status: 201,
    responses: { 201: counterSummaryJson },
  },
  ({ actor, params, context }) => createPaymentLink(actor, params.id!, context.url.origin),
);
