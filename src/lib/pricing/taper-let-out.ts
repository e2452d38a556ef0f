// Reads a taper plan for the pricing: does the leg have to be let out under the cuff?
import type { TaperPlan } from '@/lib/allowance/types';

/** True when the plan needs a let-out: outside tolerance and some line widened (change > 0). */
export function needsLetOut(plan: Pick<TaperPlan, 'withinTolerance' | 'lines'>): boolean {
  return !plan.withinTolerance && plan.lines.some((l) => l.change.mm > 0);
}
