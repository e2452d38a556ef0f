import type { Precision, Unit } from '@/lib/allowance/types';
import { PlanView } from '@/components/calculator/PlanView';
import { readLength, typedWithUnit } from '@/lib/length-reading';
import { frontPinNote } from '@/lib/leg-plan';
import type { Leg, LegValues } from '@/lib/measurement-request';
import { useLegPlan } from './use-leg-plan';

interface Props {
  leg: Leg;
  values: LegValues;
  unit: Unit;
  precision: Precision;
}

/** One leg's plan from the engine, drawn by the calculator's own components, with the front-pin note. */
export function LegPlan({ leg, values, unit, precision }: Props) {
  const { plan, problem, failure, taper } = useLegPlan(values, unit, precision);
  const note = frontPinNote(values);
  const pinned = values.backPin.trim();
  const finished = pinned ? readLength(pinned, unit, precision) : null;
  return (
    <div className="flex flex-col gap-3" data-testid={`plan-${leg}`}>
      <h2 className="text-2xl font-extrabold">Plan for the {leg} leg</h2>
      {pinned && (
        <p data-testid={`finished-${leg}`} className="text-xl">
          Finished length (back pin): <span className="measure font-extrabold">{typedWithUnit(pinned, unit)}</span>
          {finished && finished !== typedWithUnit(pinned, unit) && (
            <>
              {' '}= <span className="measure font-extrabold">{finished}</span>
            </>
          )}
        </p>
      )}
      {note && <p className="rounded-md border-l-8 border-accent bg-accent-soft px-4 py-2 text-lg font-semibold">{note}</p>}
      <PlanView plan={plan} problem={problem} failure={failure} taper={taper} />
    </div>
  );
}
