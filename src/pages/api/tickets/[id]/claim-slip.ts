// The customer's claim slip for a ticket, as a PDF to print at intake, with its tear-off tags.
import { renderClaimSlip } from '@/lib/server/claim-slip/render';
import { slipCopiesQuery } from '@/lib/shared/counter-request';
import { route } from '@/lib/server/route';
import { claimSlipData } from '@/services/counter/payments';

export const prerender = false;

/** The slip as application/pdf (?slips=1–3 copies, ?tags=0–3 per garment), named after the ticket number. */
export const GET = route(
  {
    summary: "The customer's claim slip as a PDF: 1–3 copies, 0–3 tear-off tags per garment.",
    permission: ['prices', 'read'],
    query: slipCopiesQuery,
    answer: 'application/pdf',
    examples: [{ summary: 'One slip, two tags a garment', query: { slips: '1', tags: '2' } }],
  },
  async ({ actor, params, query }) => {
    const data = await claimSlipData(actor, params.id!);
    const pdf = await renderClaimSlip(data, query);
    return new Response(pdf, {
      headers: {
        'content-type': 'application/pdf',
        'content-disposition': `inline; filename="claim-slip-${data.ticketNumber}.pdf"`,
        'cache-control': 'no-store',
      },
    });
  },
);
