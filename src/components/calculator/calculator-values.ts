// The calculator form's state and how it becomes requests for POST /api/plan.
import type { Precision, Unit } from '@/lib/allowance/types';
import type { PlanRequestInput } from '@/lib/plan-request';

/** Every length the form holds, as typed. */
export const LENGTH_FIELDS = [
  'cuffDepth',
  'hemSection',
  'turnUnder',
  'available',
  'oldCrease',
  'clothThickness',
  'hemAllowance',
  'slope',
  'widthAtEdge',
  'widthAbove',
  'heightAbove',
  'seamAllowance',
] as const;

/** The name of one length field of the form. */
export type LengthField = (typeof LENGTH_FIELDS)[number];

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
  ...(Object.fromEntries(LENGTH_FIELDS.map((f) => [f, ''])) as Record<LengthField, string>),
};

function pick(v: CalculatorValues, fields: readonly LengthField[]): Partial<Record<LengthField, string>> {
  const out: Partial<Record<LengthField, string>> = {};
  for (const f of fields) if (v[f].trim() !== '') out[f] = v[f];
  return out;
}

function scale(v: CalculatorValues) {
  return v.unit === 'in' ? { unit: v.unit, precision: v.precision } : { unit: v.unit };
}

/** The request for the main plan (a cuff or a plain hem), blank fields left out. */
export function mainRequest(v: CalculatorValues): PlanRequestInput {
  if (v.kind === 'hem') {
    return { kind: 'hem', ...scale(v), ...pick(v, ['hemAllowance', 'turnUnder', 'available', 'slope']) };
  }
  return {
    kind: 'cuff',
    ...scale(v),
    cuffDepth: v.cuffDepth,
    ...pick(v, ['hemSection', 'turnUnder', 'available', 'clothThickness', 'oldCrease']),
  };
}

/** The taper check for a cuff, or null until the cuff depth and all three taper lengths are typed. */
export function taperRequest(v: CalculatorValues): PlanRequestInput | null {
  const needed: LengthField[] = ['cuffDepth', 'widthAtEdge', 'widthAbove', 'heightAbove'];
  if (v.kind !== 'cuff' || needed.some((f) => v[f].trim() === '')) return null;
  return {
    kind: 'taper',
    ...scale(v),
    cuffDepth: v.cuffDepth,
    widthAtEdge: v.widthAtEdge,
    widthAbove: v.widthAbove,
    heightAbove: v.heightAbove,
    ...pick(v, ['hemSection', 'seamAllowance', 'clothThickness']),
  };
}
