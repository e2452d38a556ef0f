// The live plan for one leg: the same POST /api/plan the public calculator uses, fed from the
// leg's saved or being-edited values, the last good plan kept while a field is being fixed.
import type { Precision, Unit } from '@/lib/allowance/types';
import { legMainRequest, legTaperRequest } from '@/lib/leg-plan';
import type { LegValues } from '@/lib/measurement-request';
import type { Problem } from '@/components/calculator/PlanView';
import { usePlan } from '@/components/calculator/use-plan';
import { useLastGoodPlan } from '@/components/calculator/use-last-good-plan';
import type { TaperPlan } from '@/lib/allowance/types';

/** What PlanView needs for one leg, plus the field messages of the engine. */
export function useLegPlan(leg: LegValues, unit: Unit, precision: Precision) {
  const mainReq = legMainRequest(leg, unit, precision);
  const main = usePlan(mainReq);
  const taper = usePlan(legTaperRequest(leg, unit, precision));
  const plan = useLastGoodPlan(main, leg.finish === 'cuff' ? 'cuff' : 'hem');
  const problem: Problem | null = !mainReq
    ? { kind: 'empty', text: 'Type the cuff depth, or tap a preset, and the chalk lines appear here.' }
    : !main.asked
      ? { kind: 'error', text: 'Fix the field marked in red.' }
      : main.data && !main.data.ok
        ? { kind: 'error', text: main.data.error }
        : null;
  const fields = {
    ...(taper.data && !taper.data.ok ? taper.data.fields : {}),
    ...(main.data && !main.data.ok ? main.data.fields : {}),
  };
  const taperPlan: TaperPlan | null = taper.data?.ok && taper.data.plan.kind === 'taper' ? taper.data.plan : null;
  return { plan, problem, failure: main.error ? main.error.message : null, taper: taperPlan, fields };
}
