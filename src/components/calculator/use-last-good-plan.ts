// The plan on screen while the input is being fixed or the next answer is on its way: the last
// good one stays, so the chalk lines do not vanish at every half-typed length. One rule for the
// calculator and the garment page's leg plan.
import { useState } from 'react';
import type { PlanResponse } from '@/lib/shared/plan-request';
import type { PlanAnswer } from './ask-plan';

/** What a plan query holds: its answer, and whether that answer is still the previous request's. */
export interface PlanQueryState {
  data?: PlanAnswer;
  isPlaceholderData: boolean;
}

/** The plan to keep as the last good one: a fresh plan replaces it; errors and placeholders do not. */
export function keepLastGood(kept: PlanResponse | null, query: PlanQueryState): PlanResponse | null {
  return query.data?.ok && !query.isPlaceholderData ? query.data.plan : kept;
}

/** The plan to draw: the answer's plan, else the last good one, and only when it is of the kind asked for. */
export function planToShow(query: PlanQueryState, lastGood: PlanResponse | null, kind: PlanResponse['kind']): PlanResponse | null {
  const shown = query.data?.ok ? query.data.plan : lastGood;
  return shown && shown.kind === kind ? shown : null;
}

/** The plan to draw for a plan query, keeping the last good plan across errors and pending answers. */
export function useLastGoodPlan(query: PlanQueryState, kind: PlanResponse['kind']): PlanResponse | null {
  const [kept, setKept] = useState<PlanResponse | null>(null);
  const next = keepLastGood(kept, query);
  // Kept during render rather than in an effect, so the first good plan is never a render late.
  if (next !== kept) setKept(next);
  return planToShow(query, next, kind);
}
