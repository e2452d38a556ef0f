// GET /api/garments/[id]/sheet: the garment's cut sheet as a PDF, in the unit asked for (or the
// shop's own scale), its QR code opening the garment's page at the app's public address.
import type { APIRoute } from 'astro';
import { BETTER_AUTH_URL, SHEET_RENDER_TRACE } from 'astro:env/server';
import { guard, problem, refusal } from '@/lib/api';
import { fieldMessages } from '@/lib/plan-request';
import { queryObject, sheetOptions, sheetQuery } from '@/lib/sheet-request';
import { garmentSheet } from '@/services/cut-sheets';

export const prerender = false;

/** The cut sheet PDF of one garment of the shop; 404 for another shop's, 422 without a fitting. */
export const GET: APIRoute = async ({ locals, params, url }) => {
  const actor = guard(locals, ['cutsheets', 'print']);
  if (actor instanceof Response) return actor;
  const q = sheetQuery.safeParse(queryObject(url.searchParams));
  if (!q.success) return problem(400, 'Some of the sheet options are not understood.', fieldMessages(q.error));
  try {
    const { bytes, filename, by } = await garmentSheet(actor, params.id ?? '', sheetOptions(q.data), BETTER_AUTH_URL);
    return new Response(bytes, {
      headers: {
        'Content-Type': 'application/pdf',
        'Content-Disposition': `inline; filename="${filename}"`,
        'cache-control': 'no-store',
        ...(SHEET_RENDER_TRACE ? { 'X-Rendered-By': by } : {}),
      },
    });
  } catch (e) {
    return refusal(e);
  }
};
