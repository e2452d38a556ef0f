// POST /api/plan/sheet: the calculator's unsaved plan as a printable cut sheet (PDF). Public:
// signed out, it is limited per client address and waits in a queue of its own (anonymous-sheets.ts).
// Every sheet, a member's or a stranger's, is drawn in the sheet pool (render-off-thread.ts).
import { SHEET_RENDER_TRACE } from 'astro:env/server';
import { isAllowanceError } from '@/lib/allowance';
import { anonymousSheetRefusal, inAnonymousQueue } from '@/services/anonymous-sheets';
import { clientOf } from '@/lib/server/client-address';
import { problem, readBody, tooMany } from '@/lib/server/api';
import { PLAN_UNREADABLE } from '@/lib/shared/plan-request';
import { buildCutSheet, refusedFields } from '@/lib/server/cut-sheet/build';
import { renderInPool, type Rendered } from '@/lib/server/cut-sheet/render-off-thread';
import { legOrders, sheetRequest } from '@/lib/server/cut-sheet/request';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';
import { route } from '@/lib/server/route';

export const prerender = false;

type Render = (sheet: CutSheetData) => Promise<Rendered>;

/** Answers the cut sheet for the posted plan, or 400/422 with a message per field. */
export const POST = route(
  {
    summary: "The calculator's unsaved plan (one leg, or both legs apart) as a printable cut sheet PDF.",
    description: 'Public: signed out, it is limited per client address (429 with Retry-After) and queued behind members.',
    permission: 'public',
    // Read inside the strangers' queue (all of a stranger's work waits there), not before it.
    rawBody: { type: 'application/json', schema: sheetRequest },
    answer: 'application/pdf',
    examples: [{ summary: 'A plain hem in centimetres on A4', body: { kind: 'hem', unit: 'cm', hemAllowance: '4', turnUnder: '1', pageSize: 'A4' } }],
  },
  async ({ context, request }) => {
    if (context.locals?.member) return answer(request, renderInPool);
    const refused = await anonymousSheetRefusal(clientOf(context));
    if (refused) return refused;
    const queued = inAnonymousQueue(() => answer(request, renderInPool));
    return queued ?? tooMany('The calculator is printing many sheets for visitors just now. Try again in a few seconds, or sign in.', 5);
  },
);

async function answer(request: Request, render: Render): Promise<Response> {
  const read = await readBody(request, sheetRequest, PLAN_UNREADABLE);
  if (read instanceof Response) return read;
  const { pageSize, legs } = legOrders(read);
  const refused = refusedFields(legs);
  if (Object.keys(refused).length > 0) return problem(422, Object.values(refused)[0]!, refused);

  let sheet: ReturnType<typeof buildCutSheet>;
  try {
    sheet = buildCutSheet({ shop: null, ticket: null, garment: null, due: null, assignee: null, pageSize, language: read.language ?? 'en' }, legs);
  } catch (e) {
    // Fields each sound, yet no plan (widths that give no leg at the cuff top): the engine says why.
    if (!isAllowanceError(e)) throw e;
    return problem(422, e.message, e.field ? { [e.field]: e.message } : {});
  }
  let rendered: Rendered;
  try {
    rendered = await render(sheet);
  } catch (e) {
    console.error('[sheets] a calculator cut sheet could not be drawn:', e);
    return problem(500, 'The cut sheet could not be drawn. Try again in a moment.');
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
