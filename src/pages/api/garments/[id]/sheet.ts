// GET /api/garments/[id]/sheet: the garment's cut sheet as a PDF, in the unit asked for (or the
// shop's own scale), its QR code opening the garment's page at the app's public address.
import { BETTER_AUTH_URL, SHEET_RENDER_TRACE } from 'astro:env/server';
import { route } from '@/lib/server/route';
import { sheetOptions, sheetQuery } from '@/lib/shared/sheet-request';
import { garmentSheet } from '@/services/cut-sheets';

export const prerender = false;

/** The cut sheet PDF of one garment of the shop; 404 for another shop's, 422 without a fitting. */
export const GET = route(
  {
    summary: "The garment's cut sheet as a PDF (422 while it has no fitting).",
    permission: ['cutsheets', 'print'],
    query: sheetQuery,
    answer: 'application/pdf',
    examples: [{ summary: 'In millimetres on A4', query: { unit: 'mm', page: 'A4' } }],
  },
  async ({ actor, params, query }) => {
    const { bytes, filename, by } = await garmentSheet(actor, params.id!, sheetOptions(query), BETTER_AUTH_URL);
    return new Response(bytes, {
      headers: {
        'Content-Type': 'application/pdf',
        'Content-Disposition': `inline; filename="${filename}"`,
        'cache-control': 'no-store',
        ...(SHEET_RENDER_TRACE ? { 'X-Rendered-By': by } : {}),
      },
    });
  },
);
