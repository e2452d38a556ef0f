// The query of the cut-sheet PDFs: GET /api/garments/[id]/sheet and GET /api/queue/sheets. Left
// out, the unit and precision come from the shop's bench settings and the paper is Letter.
import { z } from 'zod';
import { text } from './text';
import { GARMENT_STEPS } from './garment-steps';

const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;

// The queue screen's filters as query parameters, with the device's "today" for due dates.
const queueFilterQuery = z.object({
  step: z.enum(['open', 'all', ...GARMENT_STEPS] as const, { error: 'Choose a step, "open" or "all".' }).default('open'),
  who: text()
    .trim()
    .min(1, 'Choose who: all, mine, mine-open, nobody or a person.')
    .max(100, 'Choose who: all, mine, mine-open, nobody or a person.')
    .default('all'),
  due: z.enum(['all', 'today', 'overdue'], { error: 'Choose due: all, today or overdue.' }).default('all'),
  search: text().max(100, 'Keep the search under 100 characters.').default(''),
  // The queue reads due dates against the device's own calendar; the batch must use the same day.
  today: text().regex(ISO_DAY, 'Give today as YYYY-MM-DD.').optional(),
});

/** unit=in|cm|mm, precision=8|16 (inches only), page=LETTER|A4. */
export const sheetQuery = z.object({
  unit: z.enum(['in', 'cm', 'mm'], { error: 'Choose unit=in, cm or mm.' }).optional(),
  precision: z
    .enum(['8', '16'], { error: 'Choose precision=8 or 16 (eighths or sixteenths of an inch).' })
    .transform((p) => (p === '8' ? 8 : 16) as 8 | 16)
    .optional(),
  page: z.enum(['LETTER', 'A4'], { error: 'Choose page=LETTER or A4.' }).optional(),
});

/** The batch's query: the sheet's options plus the queue screen's filters and the device's day. */
export const batchQuery = sheetQuery.extend(queueFilterQuery.shape);

/** The query parameters as a plain object; a repeated parameter keeps its first value. */
export function queryObject(params: URLSearchParams): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of params) if (!(k in out)) out[k] = v;
  return out;
}

/** What the service needs from a checked sheet query. */
export function sheetOptions(q: z.output<typeof sheetQuery>) {
  return { unit: q.unit, precision: q.precision, pageSize: q.page };
}
