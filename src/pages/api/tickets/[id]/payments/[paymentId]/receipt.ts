// One payment's receipt as a PDF to print at the counter, and the same receipt e-mailed.
import type { APIRoute } from 'astro';
import { guard, refusal, run } from '@/lib/api';
import { emailReceipt, receiptPdf } from '@/services/counter/receipts';

export const prerender = false;

/** The receipt as application/pdf; another shop's ticket or payment is a 404. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['prices', 'read']);
  if (actor instanceof Response) return actor;
  try {
    const { pdf, fileName } = await receiptPdf(actor, params.id ?? '', params.paymentId ?? '');
    return new Response(pdf, { headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${fileName}"`, 'cache-control': 'no-store' } });
  } catch (e) {
    return refusal(e);
  }
};

/** E-mails the receipt to the ticket's customer (422 when they have no address). */
export const POST: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['payments', 'take']);
  if (actor instanceof Response) return actor;
  return run(() => emailReceipt(actor, params.id ?? '', params.paymentId ?? ''));
};
