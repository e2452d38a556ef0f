// One payment's receipt as a PDF to print at the counter, and the same receipt e-mailed.
import { route } from '@/lib/server/route';
import { emailReceipt, receiptPdf } from '@/services/counter/receipts';
import { receiptSentJson } from '@/lib/server/answers/counter';

export const prerender = false;

/** The receipt as application/pdf; another shop's ticket or payment is a 404. */
export const GET = route(
  { summary: "One payment's receipt as a PDF.", permission: ['prices', 'read'], answer: 'application/pdf' },
  async ({ actor, params }) => {
    const { pdf, fileName } = await receiptPdf(actor, params.id!, params.paymentId!);
    return new Response(pdf, {
      headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${fileName}"`, 'cache-control': 'no-store' },
    });
  },
);

/** E-mails the receipt to the ticket's customer (422 when they have no address). */
export const POST = route(
  {
    summary: "E-mails the receipt to the ticket's customer (422 when they have no address).",
    permission: ['payments', 'take'],
    responses: { 200: receiptSentJson },
  },
  ({ actor, params }) => emailReceipt(actor, params.id!, params.paymentId!),
);
