// The customer's claim slip for a ticket, as a PDF to print at intake.
import type { APIRoute } from 'astro';
import { guard, refusal } from '@/lib/api';
import { renderClaimSlip } from '@/lib/claim-slip/render';
import { claimSlipData } from '@/services/counter/payments';

export const prerender = false;

/** The slip as application/pdf, named after the ticket number. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['prices', 'read']);
  if (actor instanceof Response) return actor;
  try {
    const data = await claimSlipData(actor, params.id ?? '');
    const pdf = await renderClaimSlip(data);
    return new Response(pdf, {
      headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="claim-slip-${data.ticketNumber}.pdf"`, 'cache-control': 'no-store' },
    });
  } catch (e) {
    return refusal(e);
  }
};
