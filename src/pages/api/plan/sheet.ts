// POST /api/plan/sheet: the calculator's unsaved plan as a printable cut sheet (PDF). Public:
// signed out, it is limited per client address and waits in a queue of its own (anonymous-sheets.ts).
// Every sheet, a member's or a stranger's, is drawn in the sheet pool (render-off-thread.ts).
import type { APIRoute } from 'astro';
import { SHEET_RENDER_TRACE } from 'astro:env/server';
import { isAllowanceError } from '@/lib/allowance';
import { anonymousSheetRefusal, inAnonymousQueue } from '@/services/anonymous-sheets';
import { clientOf } from '@/lib/client-address';
import { readJson, tooMany } from '@/lib/api';
import { fieldMessages } from '@/lib/plan-request';
import { buildCutSheet, refusedFields } from '@/lib/cut-sheet/build';
import { renderInPool, type Rendered } from '@/lib/cut-sheet/render-off-thread';
import { legOrders, sheetRequest } from '@/lib/cut-sheet/request';
import type { CutSheetData } from '@/lib/cut-sheet/types';

export const prerender = false;

type Render = (sheet: CutSheetData) => Promise<Rendered>;

function bad(error: string, fields: Record<string, string>, status = 400): Response {
  return Response.json({ error, fields }, { status, headers: { 'cache-control': 'no-store' } });
}

/** Answers the cut sheet for the posted plan, or 400 with a message per field. */
export const POST: APIRoute = async (context) => {
  const { request, locals } = context;
  if (locals.member) return answer(request, renderInPool);
  const refused = await anonymousSheetRefusal(clientOf(context));
  if (refused) return refused;
  // All of a stranger's work (reading the plan too), behind members' requests.
  const queued = inAnonymousQueue(() => answer(request, renderInPool));
  return queued ?? tooMany('The calculator is printing many sheets for visitors just now. Try again in a few seconds, or sign in.', 5);
};

async function answer(request: Request, render: Render): Promise<Response> {
  const read = await readJson(request);
  if (read instanceof Response) return read.status === 400 ? bad('Send the plan as JSON, for example {"kind":"cuff","unit":"in","cuffDepth":"1 1/2"}.', {}) : read;
  const body = read.value;
  const parsed = sheetRequest.safeParse(body);
  if (!parsed.success) {
    const fields = fieldMessages(parsed.error);
    return bad(Object.values(fields)[0] ?? 'The plan is not in the expected shape.', fields);
  }
  const { pageSize, legs } = legOrders(parsed.data);
  const refused = refusedFields(legs);
  if (Object.keys(refused).length > 0) return bad(Object.values(refused)[0]!, refused);

  let sheet;
  try {
    sheet = buildCutSheet({ shop: null, ticket: null, garment: null, due: null, assignee: null, pageSize }, legs);
  } catch (e) {
    // Fields each sound, yet no plan (widths that give no leg at the cuff top): the engine says why.
    if (!isAllowanceError(e)) throw e;
    return bad(e.message, e.field ? { [e.field]: e.message } : {});
  }
  let rendered: Rendered;
  try {
    rendered = await render(sheet);
  } catch (e) {
    console.error('[sheets] a calculator cut sheet could not be drawn:', e);
    return bad('The cut sheet could not be drawn. Try again in a moment.', {}, 500);
  }
  return new Response(rendered.bytes, {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': 'inline; filename="cut-sheet-unsaved.pdf"',
      'cache-control': 'no-store',
      ...(SHEET_RENDER_TRACE ? { 'X-Rendered-By': rendered.by } : {}),
    },
  });
}
