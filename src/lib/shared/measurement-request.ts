// What a fitting records for each leg, checked the same way in the garment page's form and on the
// server (PUT /api/garments/[id]/measurements). Only the shape is checked here; the server reads
// each length with the engine's parseLength and answers 422 for the field it cannot read.
import { z } from 'zod';
import { text } from './text';
import { unitSchema } from './plan-request';
import { FIELD, FIELD_KEYS, FINISH_IDS, KINDS, type FieldKey, type Finish as RegistryFinish } from './fitting/kinds';

/** The two legs, left first; they are measured apart because they can differ. */
export const LEGS = ['left', 'right'] as const;
/** A leg. */
export type Leg = (typeof LEGS)[number];

/** How a leg is finished (the registry's finishes). */
export const FINISHES = FINISH_IDS;
/** A finish. */
export type Finish = RegistryFinish;

/** Each finish on screen. */
export const FINISH_LABELS: Record<Finish, string> = Object.fromEntries(FINISH_IDS.map((f) => [f, KINDS.trousers.finishes[f].label])) as Record<Finish, string>;

/** Every length a leg can record, in the order the form asks for them (from the registry). */
export const LEG_LENGTHS = FIELD_KEYS;
/** One recorded length of a leg. */
export type LegLength = FieldKey;

/** Each length's label, in trade words. */
export const LEG_LENGTH_LABELS: Record<LegLength, string> = Object.fromEntries(FIELD_KEYS.map((k) => [k, FIELD[k].label])) as Record<LegLength, string>;

const length = (what: string) =>
  text({ error: `${what}: type a length such as 1 1/2 or 38.` })
    .trim()
    .max(40, `${what} is too long: type a length such as 1 1/2.`);

// A choice is one of its options or blank; a percent a short number (the engine's check reads it on save).
function fieldSchema(f: LegLength): z.ZodDefault<z.ZodType<string>> {
  const field = FIELD[f];
  if (field.unit === 'choice')
    return z
      .enum(['', ...(field.options ?? []).map((o) => o.value)] as [string, ...string[]], { error: `${field.label}: choose one from the list.` })
      .default('');
  if (field.unit === 'percent')
    return text({ error: `${field.label}: type a percent such as 6.` })
      .trim()
      .max(12, `${field.label}: type a percent such as 6.`)
      .default('');
  return length(LEG_LENGTH_LABELS[f]).default('');
}

/** One leg as typed: the finish, the preset applied (its id; the name only to show), and every length as text ('' = not taken). */
export const legInput = z.object({
  finish: z.enum(FINISHES, { error: 'Choose cuff, plain hem or sloped hem.' }),
  preset: text().trim().max(60, 'Keep the preset name under 60 characters.').default(''),
  /** the preset applied, by id ('' = none): the server records it only if it is the shop's and usable by the actor */
  presetId: text().trim().max(40, 'Choose the preset from the list.').default(''),
  ...(Object.fromEntries(LEG_LENGTHS.map((f) => [f, fieldSchema(f)])) as Record<LegLength, z.ZodDefault<z.ZodString>>),
});

/** The body of PUT /api/garments/[id]/measurements: the unit typed in and both legs. */
export const measurementsRequest = z.object({
  unit: unitSchema,
  legs: z.object({ left: legInput, right: legInput }),
});

/** Both legs as the form holds them. */
export type MeasurementsInput = z.input<typeof measurementsRequest>;
/** Both legs once checked. */
export type Measurements = z.output<typeof measurementsRequest>;
/** One leg once checked. */
export type LegValues = z.output<typeof legInput>;

/** A value as saved: the text as typed and, for a length, its exact value in mm (a choice or percent is its text alone). */
export interface SavedLength {
  text: string;
  mm?: number;
}

/** One leg as the API returns it. */
export interface SavedLeg {
  leg: Leg;
  unit: 'in' | 'cm' | 'mm';
  finish: Finish;
  /** the preset's current name (or, once it is removed, its name when applied) */
  preset: string | null;
  /** the preset applied, while it exists */
  presetId: string | null;
  values: Partial<Record<LegLength, SavedLength>>;
  takenAt: string;
  takenBy: string | null;
}

/** A blank leg, ready for a cuff. */
export function blankLeg(finish: Finish = 'cuff'): LegValues {
  return { finish, preset: '', presetId: '', ...(Object.fromEntries(LEG_LENGTHS.map((f) => [f, ''])) as Record<LegLength, string>) };
}

/** The form's values for a saved leg (or a blank one). */
export function legFormValues(saved: SavedLeg | undefined): LegValues {
  if (!saved) return blankLeg();
  const leg = blankLeg(saved.finish);
  leg.preset = saved.preset ?? '';
  leg.presetId = saved.presetId ?? '';
  for (const f of LEG_LENGTHS) leg[f] = saved.values[f]?.text ?? '';
  return leg;
}
