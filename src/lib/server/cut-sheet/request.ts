// What POST /api/plan/sheet accepts: the calculator's own plan request (a cuff or a plain hem),
// plus the paper size, an optional taper check, and the right leg when it differs.
import { LANGUAGES } from '../../shared/i18n/languages';
import { z } from 'zod';
import { cuffRequest, hemRequest, taperRequest } from '@/lib/shared/plan-request';
import type { LegOrder } from './build';
import type { PageSize } from '../../shared/cut-sheet-types';

const taperWidths = taperRequest.pick({
  widthAtEdge: true,
  widthAbove: true,
  heightAbove: true,
  seamAllowance: true,
  tolerance: true,
});

const leg = z.discriminatedUnion('kind', [cuffRequest.extend({ taper: taperWidths.optional() }), hemRequest], {
  error: (iss) => (iss.code === 'invalid_union' ? 'Choose a cuff or a plain hem.' : undefined),
});

/** The paper: US Letter or A4. */
export const pageSizeSchema = z.enum(['LETTER', 'A4'], { error: 'Choose Letter or A4 paper.' });

// The calculator's language (its switch or the browser's), for the sheet's words; English when left out.
const extra = { pageSize: pageSizeSchema.default('LETTER'), right: leg.optional(), language: z.enum(LANGUAGES, { error: 'Choose en or fr.' }).optional() };

/** The body of POST /api/plan/sheet. */
export const sheetRequest = z
  .discriminatedUnion('kind', [cuffRequest.extend({ taper: taperWidths.optional(), ...extra }), hemRequest.extend(extra)], {
    error: (iss) => (iss.code === 'invalid_union' ? 'Choose a cuff or a plain hem.' : undefined),
  })
  .refine((r) => !r.right || r.right.unit === r.unit, {
    path: ['right', 'unit'],
    message: 'Give both legs in the same unit.',
  });

/** A sheet request once checked. */
export type SheetRequest = z.output<typeof sheetRequest>;

type LegRequest = z.output<typeof leg>;

function orderOf(side: 'left' | 'right', r: LegRequest): LegOrder {
  if (r.kind === 'hem') {
    const { kind: _k, ...input } = r;
    return { side, finish: 'hem', input };
  }
  const { kind: _k, taper, ...input } = r;
  return taper ? { side, finish: 'cuff', input, taper } : { side, finish: 'cuff', input };
}

/** The legs a request asks for: the body is the left leg (or both), `right` the other one. */
export function legOrders(req: SheetRequest): { pageSize: PageSize; legs: LegOrder[] } {
  const { pageSize, right, language: _language, ...left } = req;
  const legs = [orderOf('left', left)];
  if (right) legs.push(orderOf('right', right));
  return { pageSize, legs };
}
