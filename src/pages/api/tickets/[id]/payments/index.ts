// A ticket's money at the counter: the summary (lines, total, payments, balance) and taking a payment.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { paymentInput } from '@/lib/counter-request';
import { smsConfigured } from '@/lib/sms-service';
import { counterSummary, takePayment } from '@/services/counter/payments';

export const prerender = false;

/** Lines, total, payments, balance due and the payment link, and whether texts are set up. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['prices', 'read']);
  if (actor instanceof Response) return actor;
  return run(async () => ({ ...(await counterSummary(actor, params.id ?? '')), textsReady: smsConfigured() }));
};

/** Takes a deposit or the balance in cash or by card. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['payments', 'take']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, paymentInput);
  if (input instanceof Response) return input;
  return run(() => takePayment(actor, params.id ?? '', input), 201);
};
