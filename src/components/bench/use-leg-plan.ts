// The live plan for one leg: the same POST /api/plan the public calculator uses, fed from the
// leg's saved or being-edited values, the last good plan kept while a field is being fixed.
import type { Precision, Unit } from '@/lib/allowance/types';
import { legHemTaperRequest, legMainRequest, legTaperRequest } from '@/lib/shared/leg-plan';
import type { LegValues } from '@/lib/shared/measurement-request';
import type { PlanRequestInput } from '@/lib/shared/plan-request';
import type { Problem } from '@/components/calculator/PlanView';
import { usePlan } from '@/components/calculator/use-plan';
import { useLastGoodPlan } from '@/components/calculator/use-last-good-plan';
import { refusalWords } from '@/components/calculator/refusal-words';
import { useLanguage, useMaybeT } from '@/components/I18n';
import type { TaperPlan } from '@/lib/allowance/types';
import { planOriginalHem, validateOriginalHemInput } from '@/lib/allowance';
import type { OriginalHemInput, OriginalHemPlan } from '@/lib/allowance/kind-types';
import { legOriginalHemInput } from '@/lib/shared/leg-plan';
import { ORIGINAL_HEM_KEYS } from '@/lib/shared/fitting/plan-lengths';
import { refusalText } from '@/lib/shared/i18n/engine-messages';
import type { MessageKey, Translate } from '@/lib/shared/i18n/format';
import { useMemo } from 'react';

const FORM_KEY: Record<string, string> = Object.fromEntries(Object.entries(ORIGINAL_HEM_KEYS).map(([form, engine]) => [engine, form]));

/** A kept factory hem planned in the page (the engine is pure and small): the plan, or each refused field's words. */
export function originalHemPlan(
  input: OriginalHemInput | null,
  t: Translate | null,
): { plan: OriginalHemPlan | null; fields: Record<string, string>; error: string | null } {
  if (!input) return { plan: null, fields: {}, error: null };
  const refused = validateOriginalHemInput(input);
  if (refused.length === 0) return { plan: planOriginalHem(input), fields: {}, error: null };
  const fields: Record<string, string> = {};
  for (const e of refused) {
    const field = FORM_KEY[e.field ?? ''] ?? e.field ?? 'shortenBy';
    fields[field] ??= t ? refusalText(t, e, field, t(`field.${field}` as MessageKey)) : e.message;
  }
  return { plan: null, fields, error: Object.values(fields)[0] ?? null };
}

// A cuff's taper check, or a plain hem's (the hem turned up must lie flat on the tapered leg too).
function taperRequest(leg: LegValues, unit: Unit, precision: Precision, letDown: boolean): PlanRequestInput | null {
  if (leg.finish === 'cuff') return legTaperRequest(leg, unit, precision, { letDown });
  // Each side is half a seam's work: in inches it is asked in half steps, so 3/8 at a seam is 3/16
  // each side, never 1/4 rounded to the shop's eighths.
  const hem = legHemTaperRequest(leg, unit, unit === 'in' ? (Math.min(32, precision * 2) as Precision) : precision, { letDown, planPrecision: precision });
  return hem && { kind: 'hem-taper', ...hem };
}

/** What useLegPlan gives: the plan to draw (or why none), the taper check, the engine's field messages. */
export type LegPlanState = ReturnType<typeof useLegPlan>;

/** What PlanView needs for one leg, plus the field messages of the engine; `letDown`: the width measured at the cut is used. */
export function useLegPlan(leg: LegValues, unit: Unit, precision: Precision, letDown = false) {
  const originalInput = legOriginalHemInput(leg, unit, precision);
  const originalKey = JSON.stringify(originalInput);
  const tOriginal = useMaybeT();
  // biome-ignore lint/correctness/useExhaustiveDependencies: the input's JSON is its identity (a new object every render)
  const original = useMemo(() => originalHemPlan(originalInput, tOriginal ?? null), [originalKey, tOriginal]);
  const mainReq = legMainRequest(leg, unit, precision);
  const main = usePlan(mainReq);
  const taper = usePlan(taperRequest(leg, unit, precision, letDown));
  const plan = useLastGoodPlan(main, leg.finish === 'cuff' ? 'cuff' : 'hem');
  // The page's language when it sent its messages; else the server's English as it came.
  const t = useMaybeT();
  const language = useLanguage();
  const said = (a: NonNullable<typeof main.data>) =>
    a.ok ? { error: '', issues: {} } : t ? refusalWords(t, a, language) : { error: a.error, issues: a.issues };
  const problem: Problem | null = !mainReq
    ? { kind: 'empty', text: t ? t('garment.planEmpty') : 'Type the cuff depth, or tap a preset, and the chalk lines appear here.' }
    : !main.asked
      ? { kind: 'error', text: t ? t('calc.problem.fix') : 'Fix the field marked in red.' }
      : main.data && !main.data.ok
        ? { kind: 'error', text: said(main.data).error }
        : null;
  const fields = {
    ...(taper.data && !taper.data.ok ? said(taper.data).issues : {}),
    ...(main.data && !main.data.ok ? said(main.data).issues : {}),
  };
  // Only an answer for this leg's own finish: a placeholder kept from a cuff is no hem's check.
  const answered = taper.asked && taper.data?.ok && taper.data.plan.kind === 'taper' ? taper.data.plan : null;
  const taperPlan: TaperPlan | null = answered && (answered.finish === 'hem') === (leg.finish !== 'cuff') ? answered : null;
  // The engine's word on widths it cannot check (a width of 0 at the cut, a taper with no leg).
  const taperProblem = taper.asked && taper.data && !taper.data.ok ? said(taper.data).error : null;
  if (leg.finish === 'original') {
    const empty = !originalInput
      ? { kind: 'empty' as const, text: t ? t('original.empty') : 'Type how far the present edge is below the pin mark and the factory hem’s depth.' }
      : null;
    const refused = original.error ? { kind: 'error' as const, text: original.error } : null;
    return { plan: null, problem: empty ?? refused, failure: null, taper: null, taperProblem: null, fields: original.fields, original: original.plan };
  }
  return { plan, problem, failure: main.error ? main.error.message : null, taper: taperPlan, taperProblem, fields, original: null as OriginalHemPlan | null };
}
