// The calculator form's state and how it becomes requests for POST /api/plan. Which length goes
// into which plan is the fitting registry's (the bench's leg plans read the same); the calculator
// adds only the turn of cloth, which the bench does not ask.
import type { Precision, Unit } from '@/lib/allowance/types';
import { engineFields, FIELD_KEYS, type FieldKey } from '@/lib/shared/fitting/kinds';
import { givenLengths, planLengths, planScale } from '@/lib/shared/fitting/plan-lengths';
import type { PlanRequestInput } from '@/lib/shared/plan-request';

/** The name of one length field of the form: a registry field, or the turn of cloth. */
export type LengthField = FieldKey | 'clothThickness';

/** Every length the form holds, as typed: what the cuff, hem and taper plans take (not a let-down pair's), and the turn of cloth. */
export const LENGTH_FIELDS: readonly LengthField[] = [
  ...new Set([
    ...(['cuff', 'hem', 'taper'] as const).flatMap((p) =>
      engineFields(p)
        .filter((f) => f.use !== 'letDown')
        .map((f) => f.key),
    ),
    'clothThickness' as const,
  ]),
];

/** Everything the calculator's form holds: the finish, the unit and the lengths as typed. */
export type CalculatorValues = {
  kind: 'cuff' | 'hem';
  unit: Unit;
  precision: Precision;
} & Record<LengthField, string>;

/** A blank form in inches to the eighth, ready for a cuff. */
export const BLANK: CalculatorValues = {
  kind: 'cuff',
  unit: 'in',
  precision: 8,
  // Every registry field too (the bench's own ones stay blank here): the values are one complete record.
  ...(Object.fromEntries([...FIELD_KEYS, 'clothThickness'].map((f) => [f, ''])) as Record<LengthField, string>),
};

const cloth = (v: CalculatorValues) => (v.clothThickness.trim() ? { clothThickness: v.clothThickness } : {});

/** The request for the main plan (a cuff, or a plain hem that slopes when a slope is typed), blank fields left out. */
export function mainRequest(v: CalculatorValues): PlanRequestInput {
  const scale = planScale(v.unit, v.precision);
  if (v.kind === 'hem') return { kind: 'hem', ...scale, ...givenLengths('hem', 'slope', v) };
  // The depth is always sent: the server's message asks for it when it is blank.
  return { kind: 'cuff', ...scale, ...givenLengths('cuff', 'cuff', v), cuffDepth: v.cuffDepth, ...cloth(v) };
}

/** The taper check for a cuff, or null until the cuff depth and all three taper lengths are typed. */
export function taperRequest(v: CalculatorValues): PlanRequestInput | null {
  const lengths = v.kind === 'cuff' ? planLengths('taper', 'cuff', v) : null;
  return lengths && ({ kind: 'taper', ...planScale(v.unit, v.precision), ...lengths, ...cloth(v) } as PlanRequestInput);
}
