import type { Precision, Unit } from '@/lib/allowance/types';
import { PlanView } from '@/components/calculator/PlanView';
import { readLength, typedWithUnit } from '@/lib/shared/length-reading';
import { frontPinNote } from '@/lib/shared/leg-plan';
import type { Leg, LegValues } from '@/lib/shared/measurement-request';
import { HemTaperCheck } from './HemTaperCheck';
import { OriginalHemPlanView } from './OriginalHemPlanView';
import { ShrinkPlanView } from './ShrinkPlanView';
import { useLegPlan, type LegPlanState } from './use-leg-plan';

interface Props {
  leg: Leg;
  values: LegValues;
  unit: Unit;
  precision: Precision;
  /** the pair is let down first: the width measured at the cutting line is used there */
  letDown?: boolean;
}

/** One leg's plan from the engine, drawn by the calculator's own components, with the front-pin note and a plain hem's taper check. */
export function LegPlan({ leg, values, unit, precision, letDown = false }: Props) {
  return <LegPlanView leg={leg} values={values} unit={unit} precision={precision} planned={useLegPlan(values, unit, precision, letDown)} />;
}

/** LegPlan drawn from a plan already asked for (the fitting form asks once, for this and its summary bar). */
export function LegPlanView({ leg, values, unit, precision, planned }: Omit<Props, 'letDown'> & { planned: LegPlanState }) {
  const { plan, problem, failure, taper, taperProblem } = planned;
  const note = frontPinNote(values);
  const pinned = values.backPin.trim();
  const finished = pinned ? readLength(pinned, unit, precision) : null;
  const cut = taper?.lines.at(-1);
  return (
    <div className="flex flex-col gap-3" data-testid={`plan-${leg}`}>
      <h2 className="text-2xl font-extrabold">Plan for the {leg} leg</h2>
      {pinned && (
        <p data-testid={`finished-${leg}`} className="text-xl">
          Finished length (back pin): <span className="measure font-extrabold">{typedWithUnit(pinned, unit)}</span>
          {finished && finished !== typedWithUnit(pinned, unit) && (
            <>
              {' '}
              = <span className="measure font-extrabold">{finished}</span>
            </>
          )}
        </p>
      )}
      {note && <p className="rounded-md border-l-8 border-accent bg-accent-soft px-4 py-2 text-lg font-semibold">{note}</p>}
      {/* The kept factory hem is planned in the page; its problem (empty or refused) shows as any plan's. */}
      {planned.original ? (
        <OriginalHemPlanView leg={leg} plan={planned.original} />
      ) : (
        // The calculator's taper view speaks of the cuff top: a plain hem's check has its own below.
        <PlanView plan={plan} problem={problem} failure={failure} taper={taper?.finish === 'hem' ? null : taper} />
      )}
      <ShrinkPlanView leg={leg} values={values} unit={unit} precision={precision} />
      {taper?.finish === 'hem' && <HemTaperCheck taper={taper} />}
      {cut?.measured && (
        <p data-testid={`measured-cut-${leg}`} className="rounded-md border-l-8 border-accent bg-accent-soft px-4 py-2 text-lg font-semibold">
          Width at the cutting line measured on the let-down leg: <span className="measure">{cut.width.text}</span> flat, used there instead of the taper
          followed down.
        </p>
      )}
      {taperProblem && (
        <p role="alert" className="rounded-md border-l-8 border-cut bg-card px-4 py-2 text-lg font-semibold">
          Taper check: {taperProblem}
        </p>
      )}
    </div>
  );
}
