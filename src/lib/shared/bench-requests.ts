// What the bench's API routes accept (intake, garments, step moves, shop bench settings), checked
// the same way in the islands' forms and on the server. Plain zod: islands import it.
import { z } from 'zod';
import { LANGUAGES } from '@/lib/shared/i18n/languages';
import { text } from './text';
import { EXISTING_FINISHES } from './existing-finish';
import { FITTING_RULES } from './fitting-rule';
import { WAIST_ORDERS } from './waist-order';
import { GARMENT_STEPS } from './garment-steps';
import { OFFERED_KINDS } from './fitting/garment-kinds';

const blankToNull = (v: string | null | undefined) => (v === '' || v === undefined ? null : v);

/** A due date as typed in a date input: YYYY-MM-DD, or blank for none. */
export const dueDate = z
  .union([z.iso.date('Use a date like 2026-03-14'), z.literal(''), z.null()])
  .optional()
  .transform(blankToNull);

/** Who works on it: a person's user id, or blank for nobody yet. */
export const assignee = z
  .union([text().trim().max(64, 'Choose someone from the list.'), z.null()])
  .optional()
  .transform(blankToNull);

/** One garment as intake or the ticket page types it. */
export const garmentInput = z.object({
  description: text().trim().min(1, 'Describe the garment, e.g. "Navy wool trousers".').max(200, 'Keep it under 200 characters.'),
  /** what kind of garment (fitting/garment-kinds.ts); left out, trousers. Fixed once taken in: its fitting's fields depend on it */
  kind: z.enum(OFFERED_KINDS, { error: 'Choose trousers, or a skirt or dress.' }).optional(),
  dueOn: dueDate,
  assigneeId: assignee,
  /** how the bottoms came in; left out, intake takes a plain hem (DEFAULT_EXISTING_FINISH) */
  existingFinish: z.enum(EXISTING_FINISHES, { error: 'Choose plain hem, cuff or unfinished.' }).optional(),
  /** "same as last time": a garment of the same customer whose fitting is copied into this one */
  fittingFrom: z
    .union([z.uuid('Choose a fitting from the list.'), z.literal(''), z.null()])
    .optional()
    .transform(blankToNull),
});

/** A change to a garment's description, due date, assignee or existing finish. */
export const garmentPatch = garmentInput.omit({ fittingFrom: true, kind: true }).partial();

/** Optional text: blank or missing is null. */
const optionalText = (max: number, message: string) =>
  z
    .union([text().trim().max(max, message), z.null()])
    .optional()
    .transform(blankToNull);

/** A new customer typed at intake: the one customer schema (customer-request.ts). */
export { newCustomer, customerPatch } from './customer-request';
import { newCustomer } from './customer-request';
import type { Part } from './fitting/kinds';

/** The finishes a garment can be priced for at intake, before the fitting decides (an estimate): a part, or jeans kept on their factory hem. */
export const INTAKE_FINISHES = ['hem', 'cuff', 'original'] as const satisfies readonly (Part | 'original')[];

/** A garment as intake takes it in, priced there when the counter picks its finish or kinds of work. */
export const intakeGarment = garmentInput
  .extend({
    /** the finish the customer asks for, priced from the list as an estimate until the fitting's */
    finish: z
      .union([z.enum(INTAKE_FINISHES, { error: 'Choose a plain hem, a cuff or the original hem kept.' }), z.literal(''), z.null()])
      .optional()
      .transform((v): (typeof INTAKE_FINISHES)[number] | null => (v === 'hem' || v === 'cuff' || v === 'original' ? v : null)),
    /** the lead's kinds of work picked for this garment ("Replace zip"), each once */
    work: z
      .array(z.uuid('Choose kinds of work from the price list.'))
      .max(12, 'Pick at most 12 kinds of work per garment.')
      .refine((ids) => new Set(ids).size === ids.length, 'Pick each kind of work once per garment.')
      .default([]),
  })
  .refine((g) => !g.kind || g.kind === 'trousers' || g.finish === null, {
    // A hem, cuff or kept factory hem is a trouser leg's finish: another kind is priced by its own line.
    message: 'A finish is chosen for trousers only: leave it blank for this kind of garment.',
    path: ['finish'],
  });

/** The body of POST /api/tickets: an existing or a new customer, a note, the garments brought in,
 * and whether the ticket is a rush (priced at intake with the garments' finishes and work). */
export const intakeRequest = z.object({
  customerId: z
    .union([z.uuid('Choose a customer from the list.'), z.literal(''), z.null()])
    .optional()
    .transform(blankToNull),
  customer: newCustomer.optional(),
  note: optionalText(2000, 'Keep the note under 2000 characters.'),
  dueOn: dueDate,
  garments: z.array(intakeGarment).max(20, 'Open a second ticket for more than 20 garments.').default([]),
  rush: z.boolean({ error: 'Say whether the ticket is a rush (true or false).' }).default(false),
});

/** True when intake asks for pricing (a finish, a kind of work or rush): the counter's or the lead's work. */
export function pricesAtIntake(input: Pick<z.output<typeof intakeRequest>, 'garments' | 'rush'>): boolean {
  return input.rush || input.garments.some((g) => g.finish !== null || g.work.length > 0);
}

/** Intake as typed. */
export type IntakeInput = z.input<typeof intakeRequest>;
/** Intake once checked. */
export type Intake = z.output<typeof intakeRequest>;

/** The body of POST /api/garments/[id]/step: the step to move to (the next one). */
export const stepRequest = z.object({ to: z.enum(GARMENT_STEPS, { error: 'Choose one of the bench steps.' }) });

/** The body of POST /api/garments/[id]/step-back: the step the garment stands at as seen, so a move made meanwhile is not undone blind. */
export const stepBackRequest = z.object({ from: z.enum(GARMENT_STEPS, { error: 'Choose one of the bench steps.' }) });

/** How a shop types and shows lengths: inches to 1/8 or 1/16, cm or mm. */
export const SCALES = ['in8', 'in16', 'cm', 'mm'] as const;
/** A shop's measuring scale. */
export type Scale = (typeof SCALES)[number];
/** Each scale on screen. */
export const SCALE_LABELS: Record<Scale, string> = { in8: 'Inches, to 1/8', in16: 'Inches, to 1/16', cm: 'Centimetres', mm: 'Millimetres' };

/** The unit and inch precision a scale stands for. */
export function scaleUnit(scale: Scale): { unit: 'in' | 'cm' | 'mm'; precision: 8 | 16 } {
  return scale === 'in8' ? { unit: 'in', precision: 8 } : scale === 'in16' ? { unit: 'in', precision: 16 } : { unit: scale, precision: 8 };
}

/** The body of PUT /api/bench-settings. */
export const settingsRequest = z.object({
  scale: z.enum(SCALES, { error: 'Choose inches (1/8 or 1/16), cm or mm.' }),
  stepLabels: z.partialRecord(z.enum(GARMENT_STEPS), text().trim().max(40, 'Keep a step name under 40 characters.')).default({}),
  // Left out, the shop's rule stays as it was: a client that only changes the scale never loosens it.
  fittingRule: z.enum(FITTING_RULES, { error: 'Choose warn or refuse.' }).optional(),
  // Left out, the shop's order stays as it was.
  waistOrder: z.enum(WAIST_ORDERS, { error: 'Choose to pin now or to alter the waist first.' }).optional(),
  // Left out, the shop's language stays as it was.
  language: z.enum(LANGUAGES, { error: 'Choose one of the languages offered.' }).optional(),
});
