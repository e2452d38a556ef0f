import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import type { Precision, Unit } from '@/lib/allowance/types';
import { planRequest, type PlanRequest } from '@/lib/plan-request';
import { BLANK, LENGTH_FIELDS, mainRequest, taperRequest, type CalculatorValues, type LengthField } from './calculator-values';
import { CuffFields } from './CuffFields';
import { HemFields } from './HemFields';
import { PlanView, type Problem } from './PlanView';
import { Segmented } from './Segmented';
import { TaperFields } from './TaperFields';
import { useDebounced } from './use-debounced';
import { useLastGoodPlan } from './use-last-good-plan';
import { usePlan, type PlanAnswer } from './use-plan';

type Scale = 'in8' | 'in16' | 'cm' | 'mm';
const SCALES: { value: Scale; label: string }[] = [
  { value: 'in8', label: 'in · 1/8' },
  { value: 'in16', label: 'in · 1/16' },
  { value: 'cm', label: 'cm' },
  { value: 'mm', label: 'mm' },
];
const toScale = (unit: Unit, precision: Precision): Scale => (unit === 'in' ? (precision === 16 ? 'in16' : 'in8') : unit);

function serverMessage(answer: PlanAnswer | undefined, field: string): string | undefined {
  return answer && !answer.ok ? answer.fields[field] : undefined;
}

// Same schema as the API. The form holds every finish's fields at once; zod checks the chosen
// kind's and drops the rest, which the resolver's key-by-key typing cannot express.
const resolver = zodResolver(planRequest) as unknown as Resolver<CalculatorValues, unknown, PlanRequest>;

/** The form on the left, the plan on the right; the plan follows the typing a quarter-second behind. */
export function CalculatorForm() {
  const form = useForm<CalculatorValues, unknown, PlanRequest>({
    defaultValues: BLANK,
    resolver,
    mode: 'onChange',
  });
  const { register, setValue, control, formState, clearErrors, handleSubmit } = form;
  const values = useWatch({ control }) as CalculatorValues;
  const settled = useDebounced(values, 250);
  const [taperOpen, setTaperOpen] = useState(false);

  const main = usePlan(mainRequest(settled));
  const taper = usePlan(taperOpen ? taperRequest(settled) : null);

  const plan = useLastGoodPlan(main, values.kind);

  const errorFor = (f: LengthField): string | undefined =>
    formState.errors[f]?.message ?? serverMessage(main.data, f) ?? (taperOpen ? serverMessage(taper.data, f) : undefined);

  const setScale = (s: Scale) => {
    const unit: Unit = s === 'in8' || s === 'in16' ? 'in' : s;
    if (unit !== values.unit) {
      // A length typed in the old unit keeps its meaning: "5" becomes "5 in", and the engine converts.
      for (const f of LENGTH_FIELDS) {
        const typed = values[f].trim();
        if (typed !== '' && !/[a-zA-Z"″”]/.test(typed)) setValue(f, `${typed} ${values.unit}`);
      }
    }
    setValue('unit', unit);
    setValue('precision', s === 'in16' ? 16 : 8);
  };

  const setKind = (kind: CalculatorValues['kind']) => {
    clearErrors();
    setValue('kind', kind);
  };

  const blankDepth = settled.kind === 'cuff' && settled.cuffDepth.trim() === '';
  const problem: Problem | null = !main.asked
    ? blankDepth
      ? { kind: 'empty', text: 'Type the cuff depth, or tap a common one, and the chalk lines appear here.' }
      : { kind: 'error', text: 'Fix the field marked in red.' }
    : main.data && !main.data.ok
      ? { kind: 'error', text: main.data.error }
      : null;
  const unitLabel = values.unit;

  return (
    // Words without tabular figures (tabular hyphens gape); lengths turn them back on with `measure`.
    <div className="grid items-start gap-6 [font-feature-settings:'cv11'_1] lg:grid-cols-[minmax(0,27rem)_minmax(0,1fr)]">
      <form
        aria-label="Measurements"
        noValidate
        onSubmit={handleSubmit(() => undefined)}
        className="flex flex-col gap-5 rounded-lg border-2 border-rule bg-card p-4"
      >
        <Segmented
          name="finish"
          legend="Finish"
          value={values.kind}
          onChange={setKind}
          options={[
            { value: 'cuff', label: 'Cuff' },
            { value: 'hem', label: 'Plain hem' },
          ]}
        />
        <Segmented name="scale" legend="Measure in" value={toScale(values.unit, values.precision)} onChange={setScale} options={SCALES} />
        {values.kind === 'cuff' ? (
          <CuffFields register={register} unit={unitLabel} errorFor={errorFor} cuffDepth={values.cuffDepth}
            onPick={(v) => setValue('cuffDepth', v, { shouldValidate: true })} />
        ) : (
          <HemFields register={register} unit={unitLabel} errorFor={errorFor} />
        )}
        {values.kind === 'cuff' && (
          <TaperFields open={taperOpen} onToggle={setTaperOpen} register={register} unit={unitLabel} errorFor={errorFor}
            waiting={taperOpen && !taper.asked}
            problem={taper.data && !taper.data.ok ? taper.data.error : null} />
        )}
      </form>
      <PlanView
        plan={plan}
        problem={problem}
        failure={main.error ? main.error.message : null}
        taper={taperOpen && taper.data?.ok && taper.data.plan.kind === 'taper' ? taper.data.plan : null}
      />
    </div>
  );
}
