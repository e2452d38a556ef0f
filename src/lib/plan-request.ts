// What POST /api/plan accepts, checked the same way in the calculator's form and on the server.
// Only the shape is checked here: what a length *means* ("1 1/2", "38 mm") is the engine's call.
import { z } from 'zod';
import { text } from './text';
import type { CuffPlan, HemPlan, TaperPlan } from '@/lib/allowance/types';

// Generous bounds: a length outside them is a slip of the keyboard, never a trouser.
const MAX_NUMBER = 100_000;
const MAX_TEXT = 40;

function lengthOf(what: string) {
  return z.union(
    [
      z
        .number()
        .min(-MAX_NUMBER, `${what} is far too large to be a length.`)
        .max(MAX_NUMBER, `${what} is far too large to be a length.`),
      text().trim().max(MAX_TEXT, `${what} is too long: type a length such as 1 1/2.`),
    ],
    { error: (iss) => (iss.input === undefined ? `Enter the ${what.toLowerCase()}.` : `${what}: type a length such as 1 1/2 or 38.`) },
  );
}

/** A length the plan cannot do without: a number, or text that is not blank. */
function required(what: string) {
  return lengthOf(what).refine((v) => v !== '', `Enter the ${what.toLowerCase()}.`);
}

/** A length that may be left blank; blank means "use the usual". */
function optional(what: string) {
  return lengthOf(what)
    .optional()
    .transform((v) => (v === '' ? undefined : v));
}

/** The unit a plan is typed and shown in. */
export const unitSchema = z.enum(['in', 'cm', 'mm'], { error: 'Choose inches, cm or mm.' });

/** How finely inches are shown: eighths, sixteenths or thirty-seconds. */
export const precisionSchema = z.union([z.literal(8), z.literal(16), z.literal(32)], {
  error: 'Show inches to 1/8, 1/16 or 1/32.',
});

const common = {
  unit: unitSchema,
  precision: precisionSchema.optional(),
};

/** A cuff: the four chalk lines from the pin mark down. */
export const cuffRequest = z.object({
  kind: z.literal('cuff'),
  ...common,
  cuffDepth: required('Cuff depth'),
  hemSection: optional('Third section'),
  turnUnder: optional('Turn-under'),
  available: optional('Cloth below the mark'),
  clothThickness: optional('Turn of cloth'),
  oldCrease: optional('Old crease'),
  slope: optional('Slope'),
});

/** A plain hem: finished edge and cutting line, level or sloped. */
export const hemRequest = z.object({
  kind: z.literal('hem'),
  ...common,
  hemAllowance: optional('Hem allowance'),
  turnUnder: optional('Turn-under'),
  available: optional('Cloth below the mark'),
  slope: optional('Slope'),
});

/** A taper check: can the cuff-top width be kept straight down to the cut? */
export const taperRequest = z.object({
  kind: z.literal('taper'),
  ...common,
  cuffDepth: required('Cuff depth'),
  hemSection: optional('Third section'),
  widthAtEdge: required('Width at the finished edge'),
  widthAbove: required('Width higher up'),
  heightAbove: required('Height above the edge'),
  seamAllowance: optional('Seam allowance'),
  tolerance: optional('Tolerance'),
  clothThickness: optional('Turn of cloth'),
});

/** The body of POST /api/plan: one plan of one kind. */
export const planRequest = z.discriminatedUnion('kind', [cuffRequest, hemRequest, taperRequest], {
  error: (iss) =>
    iss.code === 'invalid_union'
      ? 'Choose a cuff, a plain hem or a taper check.'
      : 'Send the plan as an object with a kind (cuff, hem or taper), a unit and the lengths.',
});

/** A plan request as typed (blank optional lengths allowed). */
export type PlanRequestInput = z.input<typeof planRequest>;
/** A plan request once checked (blank lengths dropped). */
export type PlanRequest = z.output<typeof planRequest>;

/** What POST /api/plan answers with 200. */
export type PlanResponse = CuffPlan | HemPlan | TaperPlan;

/** What POST /api/plan answers with 4xx/5xx: a message, and one per field at fault. */
export interface PlanErrorBody {
  error: string;
  fields: Record<string, string>;
}

/** Turns zod's issues into one message per field path ("cuffDepth", "kind"…), first issue wins. */
export function fieldMessages(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.');
    if (key && !(key in fields)) fields[key] = issue.message;
  }
  return fields;
}
