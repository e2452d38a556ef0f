// What POST /api/plan answers with 200: the engine's plan of a cuff, a plain hem, or a taper check
// under either (src/lib/allowance/types.ts), as a zod schema of the JSON sent. The route answers
// the engine's own object, so this mirrors those types field for field; the API test parses every
// example's answer with it (no field more or less).
import { z } from 'zod';
import { WARNING_CODES } from '@/lib/allowance/types';
import { precisionSchema, unitSchema } from '@/lib/shared/plan-request';

/** A length held exactly (mm) and shown in the plan's unit (text). */
export const lenJson = z.object({ mm: z.number(), text: z.string() });

/** A warning: its code, the English sentence, and its figures as shown (for any language). */
export const planWarningJson = z.object({ code: z.enum(WARNING_CODES), message: z.string(), values: z.record(z.string(), z.string()) });

const cuffLineName = z.enum(['finished-edge', 'cuff-top', 'inner-fold', 'cut']);
const lineNumber = z.union([z.literal(1), z.literal(2), z.literal(3), z.literal(4)]);
const plan = { unit: unitSchema, precision: precisionSchema, warnings: z.array(planWarningJson) };
const cloth = { required: lenJson, enough: z.boolean().nullable(), shortBy: lenJson.nullable(), spare: lenJson.nullable() };

/** A cuff plan: the four chalk lines, the cloth check, what else fits when it is short, where an old crease lands. */
export const cuffPlanJson = z.object({
  kind: z.literal('cuff'),
  ...plan,
  cuffDepth: lenJson,
  hemSection: lenJson,
  turnUnder: lenJson,
  lines: z.array(z.object({ n: lineNumber, name: cuffLineName, belowMark: lenJson, aboveRawEdge: lenJson.nullable() })),
  ...cloth,
  alternatives: z
    .object({
      shorterSection: lenJson.nullable(),
      deepestCuff: lenJson.nullable(),
      plainHem: z.object({ required: lenJson, fits: z.boolean() }),
      facedCuff: z.object({ required: lenJson, fits: z.boolean() }),
    })
    .nullable(),
  creaseLands: z
    .object({
      place: z.enum(['leg-visible', 'at-cuff-top', 'behind-cuff', 'cuff-face', 'inside', 'on-fold', 'cut-away']),
      heightAboveEdge: lenJson,
      visible: z.boolean(),
      message: z.string(),
      values: z.record(z.string(), z.string()),
    })
    .optional(),
});

/** A plain hem plan: the finished edge and the cutting line, at the back and the front. */
export const hemPlanJson = z.object({
  kind: z.literal('hem'),
  ...plan,
  hemAllowance: lenJson,
  turnUnder: lenJson,
  slope: lenJson,
  lines: z.array(
    z.object({
      n: z.union([z.literal(1), z.literal(2)]),
      name: z.enum(['finished-edge', 'cut']),
      belowMark: lenJson,
      frontBelowMark: lenJson,
      aboveRawEdge: lenJson.nullable(),
    }),
  ),
  ...cloth,
});

/** A taper check under a cuff, or under a plain hem (`finish: 'hem'`): the work at each chalk line to keep the leg straight. */
export const taperPlanJson = z.object({
  kind: z.literal('taper'),
  finish: z.literal('hem').optional(),
  ...plan,
  targetWidth: lenJson,
  lines: z.array(
    z.object({
      n: lineNumber,
      name: cuffLineName,
      belowMark: lenJson,
      width: lenJson,
      change: lenJson,
      perSeam: lenJson,
      perSide: lenJson,
      measured: z.boolean().optional(),
    }),
  ),
  withinTolerance: z.boolean(),
  feasible: z.boolean().nullable(),
});

/** What POST /api/plan answers with 200: one plan, told apart by `kind`. */
export const planAnswerJson = z.discriminatedUnion('kind', [cuffPlanJson, hemPlanJson, taperPlanJson]);

/** The plan as sent. */
export type PlanAnswer = z.output<typeof planAnswerJson>;
