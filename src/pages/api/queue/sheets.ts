// GET /api/queue/sheets: the morning's cut sheets, one garment per page, for the queue filtered
// exactly as on screen (the queue island's own filter function); a last page names the garments
// left out because they have no fitting yet.
import type { APIRoute } from 'astro';
import { BETTER_AUTH_URL, SHEET_RENDER_TRACE } from 'astro:env/server';
import { guard, problem, refusal } from '@/lib/api';
import { fieldMessages } from '@/lib/plan-request';
import { batchQuery, queryObject, sheetOptions } from '@/lib/sheet-request';
import { queueSheetsStream, serverToday } from '@/services/cut-sheets';

export const prerender = false;

/** One PDF of the filtered queue's cut sheets, streamed as it is drawn; X-Sheets and X-Skipped say how many of each. */
export const GET: APIRoute = async ({ locals, url }) => {
  const actor = guard(locals, ['cutsheets', 'print']);
  if (actor instanceof Response) return actor;
  const q = batchQuery.safeParse(queryObject(url.searchParams));
  if (!q.success) return problem(400, 'Some of the queue filters are not understood.', fieldMessages(q.error));
  const { step, who, due, search, today } = q.data;
  try {
    const batch = await queueSheetsStream(actor, { step, who, due, search }, today ?? serverToday(), sheetOptions(q.data), BETTER_AUTH_URL);
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
  } catch (e) {
    return refusal(e);
  }
};
