// POST /api/plan/sheet: the calculator's unsaved plan as a printable cut sheet (PDF). Public.
import type { APIRoute } from 'astro';
import { fieldMessages } from '@/lib/plan-request';
import { buildCutSheet, refusedFields } from '@/lib/cut-sheet/build';
import { renderCutSheet } from '@/lib/cut-sheet/render';
import { legOrders, sheetRequest } from '@/lib/cut-sheet/request';

export const prerender = false;

function bad(error: string, fields: Record<string, string>): Response {
  return Response.json({ error, fields }, { status: 400, headers: { 'cache-control': 'no-store' } });
}

/** Answers the cut sheet for the posted plan, or 400 with a message per field. */
export const POST: APIRoute = async ({ request }) => {
  let body: unknown;
  try {
    body = await request.json();
  } catch {
    return bad('Send the plan as JSON, for example {"kind":"cuff","unit":"in","cuffDepth":"1 1/2"}.', {});
  }
  const parsed = sheetRequest.safeParse(body);
  if (!parsed.success) {
    const fields = fieldMessages(parsed.error);
    return bad(Object.values(fields)[0] ?? 'The plan is not in the expected shape.', fields);
  }
  const { pageSize, legs } = legOrders(parsed.data);
  const refused = refusedFields(legs);
  if (Object.keys(refused).length > 0) return bad(Object.values(refused)[0]!, refused);

  const sheet = buildCutSheet({ shop: null, ticket: null, garment: null, due: null, assignee: null, pageSize }, legs);
  const bytes = await renderCutSheet(sheet);
  return new Response(bytes, {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': 'inline; filename="cut-sheet-unsaved.pdf"',
      'cache-control': 'no-store',
    },
  });
};
