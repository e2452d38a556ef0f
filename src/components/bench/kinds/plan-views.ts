// Each whole-garment kind's live plan view, by kind: the one place a new kind's view is plugged in.
import type { ComponentType } from 'react';
import type { WholeGarmentKind } from '@/lib/shared/fitting/garment-kinds';
import { SkirtPlanView } from './SkirtPlanView';
import { SleevePlanView } from './SleevePlanView';

/** The plan views by kind (null: the kind is declared, its view not built yet). */
// biome-ignore lint/suspicious/noExplicitAny: each view takes its own kind's plan, which the adapter of that kind makes
export const PLAN_VIEWS: Record<WholeGarmentKind, ComponentType<{ plan: any }> | null> = {
  skirt: SkirtPlanView,
  sleeves: SleevePlanView,
};
