// What POST /api/plan accepts, checked on the server; the public calculator checks the same in the
// browser without zod (plan-check.ts), from the same bounds and messages (plan-messages.ts).
// Only the shape is checked here: what a length *means* ("1 1/2", "38 mm") is the engine's call.
import { z } from 'zod';
import { text } from './text';
import type { CuffPlan, HemPlan, TaperPlan } from '@/lib/allowance/types';
import {
  KIND_MESSAGE,
  lengthMessages,
  MAX_LENGTH_NUMBER,
  MAX_LENGTH_TEXT,
  PLAN_FIELD_NAMES as N,
  PRECISION_MESSAGE,
  SHAPE_MESSAGE,
  UNIT_MESSAGE,
} from './plan-messages';

// Bounds and messages live in plan-messages.ts: the public calculator checks with them in the
// browser without zod (plan-check.ts), and a test proves both give the same message.
function lengthOf(what: string) {
  const say = lengthMessages(what);
  return z.union(
    [z.number().min(-MAX_LENGTH_NUMBER, say.farTooLarge).max(MAX_LENGTH_NUMBER, say.farTooLarge), text().trim().max(MAX_LENGTH_TEXT, say.tooLong)],
    { error: (iss) => (iss.input === undefined ? say.enter : say.notALength) },
  );
}

/** A length the plan cannot do without: a number, or text that is not blank. */
function required(what: string) {
  return lengthOf(what).refine((v) => v !== '', lengthMessages(what).enter);
}

/** A length that may be left blank; blank means "use the usual". */
function optional(what: string) {
  return lengthOf(what)
    .optional()
    .transform((v) => (v === '' ? undefined : v));
}

/** The unit a plan is typed and shown in. */
export const unitSchema = z.enum(['in', 'cm', 'mm'], { error: UNIT_MESSAGE });

/** How finely inches are shown: eighths, sixteenths or thirty-seconds. */
export const precisionSchema = z.union([z.literal(8), z.literal(16), z.literal(32)], { error: PRECISION_MESSAGE });

const common = {
  unit: unitSchema,
  precision: precisionSchema.optional(),
};

/** A cuff: the four chalk lines from the pin mark down. */
export const cuffRequest = z.object({
  kind: z.literal('cuff'),
  ...common,
  cuffDepth: required(N.cuffDepth),
  hemSection: optional(N.hemSection),
  turnUnder: optional(N.turnUnder),
  available: optional(N.available),
  clothThickness: optional(N.clothThickness),
  oldCrease: optional(N.oldCrease),
  slope: optional(N.slope),
});

/** A plain hem: finished edge and cutting line, level or sloped. */
export const hemRequest = z.object({
  kind: z.literal('hem'),
  ...common,
  hemAllowance: optional(N.hemAllowance),
  turnUnder: optional(N.turnUnder),
  available: optional(N.available),
  slope: optional(N.slope),
  // The finished edge left below the pin mark for unwashed cloth (the bench's shrink allowance).
  edgeBelowMark: optional(N.edgeBelowMark),
});

/** A taper check: can the cuff-top width be kept straight down to the cut? */
export const taperRequest = z.object({
  kind: z.literal('taper'),
  ...common,
  cuffDepth: required(N.cuffDepth),
  hemSection: optional(N.hemSection),
  widthAtEdge: required(N.widthAtEdge),
  widthAbove: required(N.widthAbove),
  heightAbove: required(N.heightAbove),
  seamAllowance: optional(N.seamAllowance),
  tolerance: optional(N.tolerance),
  clothThickness: optional(N.clothThickness),
  // A let-down leg: the width measured at the cut, and the old fold the taper holds down to.
  widthAtCut: optional(N.widthAtCut),
  oldCrease: optional(N.oldCrease),
});

/** A taper check under a plain hem: will the hem, turned up, lie flat on the tapered leg? */
export const hemTaperRequest = z.object({
  kind: z.literal('hem-taper'),
  ...common,
  hemAllowance: optional(N.hemAllowance),
  widthAtEdge: required(N.widthAtEdge),
  widthAbove: required(N.widthAbove),
  heightAbove: required(N.heightAbove),
  widthAtCut: optional(N.widthAtCut),
  seamAllowance: optional(N.seamAllowance),
  tolerance: optional(N.tolerance),
  edgeBelowMark: optional(N.edgeBelowMark),
});

/** The body of POST /api/plan: one plan of one kind. */
export const planRequest = z.discriminatedUnion('kind', [cuffRequest, hemRequest, taperRequest, hemTaperRequest], {
  error: (iss) => (iss.code === 'invalid_union' ? KIND_MESSAGE : SHAPE_MESSAGE),
});

/** A plan request as typed (blank optional lengths allowed). */
export type PlanRequestInput = z.input<typeof planRequest>;
/** A plan request once checked (blank lengths dropped). */
export type PlanRequest = z.output<typeof planRequest>;

/** What POST /api/plan answers with 200. */
export type PlanResponse = CuffPlan | HemPlan | TaperPlan;

/** The 400 message for a plan that is not JSON at all, with an example of one. */
export const PLAN_UNREADABLE = 'Send the plan as JSON, for example {"kind":"cuff","unit":"in","cuffDepth":"1 1/2"}.';

/** Turns zod's issues into one message per field path ("cuffDepth", "kind"…), first issue wins. */
export function fieldMessages(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.');
    if (key && !(key in fields)) fields[key] = issue.message;
  }
  return fields;
}
