// The customer's claim slip for a ticket, as a PDF to print at intake, with its tear-off tags.
import type { APIRoute } from 'astro';
import { guard, problem, refusal } from '@/lib/api';
import { renderClaimSlip } from '@/lib/claim-slip/render';
import { slipCopiesQuery } from '@/lib/counter-request';
import { fieldMessages } from '@/lib/plan-request';
import { queryObject } from '@/lib/sheet-request';
import { claimSlipData } from '@/services/counter/payments';

export const prerender = false;

/** The slip as application/pdf (?slips=1–3 copies, ?tags=0–3 per garment), named after the ticket number. */
export const GET: APIRoute = async ({ locals, params, url }) => {
  const actor = guard(locals, ['prices', 'read']);
  if (actor instanceof Response) return actor;
  const q = slipCopiesQuery.safeParse(queryObject(url.searchParams));
  if (!q.success) return problem(400, 'The number of slips or tags is not understood.', fieldMessages(q.error));
  try {
    const data = await claimSlipData(actor, params.id ?? '');
    const pdf = await renderClaimSlip(data, q.data);
    return new Response(pdf, {
      headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="claim-slip-${data.ticketNumber}.pdf"`, 'cache-control': 'no-store' },
    });
  } catch (e) {
    return refusal(e);
  }
};
