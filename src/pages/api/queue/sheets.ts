// GET /api/queue/sheets: the morning's cut sheets, one garment per page, for the queue filtered
// exactly as on screen (the queue island's own filter function); a last page names the garments
// left out because they have no fitting yet.
import { BETTER_AUTH_URL, SHEET_RENDER_TRACE } from 'astro:env/server';
import { route } from '@/lib/server/route';
import { batchQuery, sheetOptions } from '@/lib/shared/sheet-request';
import { queueSheetsStream, serverToday } from '@/services/cut-sheets';

export const prerender = false;

/** One PDF of the filtered queue's cut sheets, streamed as it is drawn; X-Sheets and X-Skipped say how many of each. */
export const GET = route(
  {
    summary: "One PDF of the filtered queue's cut sheets, a garment a page (X-Sheets and X-Skipped count them); 422 when nothing is to print.",
    permission: ['cutsheets', 'print'],
    query: batchQuery,
    answer: 'application/pdf',
    examples: [{ summary: 'Every open garment', query: { step: 'open', who: 'all', due: 'all' } }],
  },
  async ({ actor, query }) => {
    const { step, who, due, search, today } = query;
    const batch = await queueSheetsStream(actor, { step, who, due, search }, today ?? serverToday(), sheetOptions(query), BETTER_AUTH_URL);
    return new Response(batch.body, {
      headers: {
        'Content-Type': 'application/pdf',
        'Content-Disposition': `inline; filename="${batch.filename}"`,
        'cache-control': 'no-store',
        'X-Sheets': String(batch.sheets),
        'X-Skipped': String(batch.skipped.length),
        ...(SHEET_RENDER_TRACE ? { 'X-Rendered-By': batch.by } : {}),
      },
    });
  },
);
