import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import type { Precision, Unit } from '@/lib/allowance/types';
import { planRequest, type PlanRequest } from '@/lib/plan-request';
import { BLANK, LENGTH_FIELDS, mainRequest, taperRequest, type CalculatorValues, type LengthField } from './calculator-values';
import { convertTyped, readLength } from '@/lib/length-reading';
import { CuffFields } from './CuffFields';
import { HemFields } from './HemFields';
import type { FieldInfo } from './LengthField';
import { PlanView, type Problem } from './PlanView';
import { PrintPlan } from './PrintPlan';
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

const UNIT_WORDS: Record<Unit, string> = { in: 'inches', cm: 'centimetres', mm: 'millimetres' };

/** Fields whose text could not be carried to the new unit: the text left, and the unit it was typed in. */
type Unconverted = Partial<Record<LengthField, { text: string; from: Unit }>>;

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
  const [unconverted, setUnconverted] = useState<Unconverted>({});

  const main = usePlan(mainRequest(settled));
  const taper = usePlan(taperOpen ? taperRequest(settled) : null);

  const plan = useLastGoodPlan(main, values.kind);

  const errorFor = (f: LengthField): string | undefined =>
    formState.errors[f]?.message ?? serverMessage(main.data, f) ?? (taperOpen ? serverMessage(taper.data, f) : undefined);

  const setScale = (s: Scale) => {
    const unit: Unit = s === 'in8' || s === 'in16' ? 'in' : s;
    const precision: Precision = s === 'in16' ? 16 : 8;
    if (unit !== values.unit) {
      // A length typed in the old unit keeps its meaning, written as the new unit writes it
      // ("1 1/2" in inches becomes "3.8" in cm); what cannot be read stays as typed, flagged.
      const left: Unconverted = {};
      for (const f of LENGTH_FIELDS) {
        const carried = convertTyped(values[f], values.unit, unit, precision);
        if (carried.ok) {
          setValue(f, carried.text);
          continue;
        }
        // Flagged until it is retyped, or until the unit it was typed in comes back.
        const from = unconverted[f]?.text === values[f] ? unconverted[f].from : values.unit;
        if (from !== unit) left[f] = { text: values[f], from };
      }
      setUnconverted(left);
    }
    setValue('unit', unit);
    setValue('precision', precision);
  };

  const info: FieldInfo = (f) => {
    const left = unconverted[f]?.text === values[f] ? unconverted[f] : undefined;
    return {
      reading: readLength(values[f], values.unit, values.precision),
      note: left ? `Left as typed in ${UNIT_WORDS[left.from]}: it could not be read, so it was not changed to ${UNIT_WORDS[values.unit]}. Check it.` : null,
    };
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
  const taperPlan = taperOpen && taper.data?.ok && taper.data.plan.kind === 'taper' ? taper.data.plan : null;
  const taperAsked = taperRequest(settled);
  // The sheet prints what is on screen: the main plan, and the taper check when it was answered.
  const sheetBody =
    problem || !main.data?.ok
      ? null
      : {
          ...mainRequest(settled),
          ...(taperPlan && taperAsked?.kind === 'taper'
            ? { taper: { widthAtEdge: taperAsked.widthAtEdge, widthAbove: taperAsked.widthAbove, heightAbove: taperAsked.heightAbove, seamAllowance: taperAsked.seamAllowance } }
            : {}),
        };

  return (
    // Words without tabular figures (tabular hyphens gape); lengths turn them back on with `measure`.
    // On paper the form is hidden and the plan takes the whole width, whatever the screen was.
    <div className="grid items-start gap-6 [font-feature-settings:'cv11'_1] lg:grid-cols-[minmax(0,27rem)_minmax(0,1fr)] print:block">
      <div className="flex flex-col gap-6 print:hidden">
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
            <CuffFields register={register} unit={unitLabel} errorFor={errorFor} info={info} cuffDepth={values.cuffDepth}
              onPick={(v) => setValue('cuffDepth', v, { shouldValidate: true })} />
          ) : (
            <HemFields register={register} unit={unitLabel} errorFor={errorFor} info={info} />
          )}
          {values.kind === 'cuff' && (
            <TaperFields open={taperOpen} onToggle={setTaperOpen} register={register} unit={unitLabel} errorFor={errorFor} info={info}
              waiting={taperOpen && !taper.asked}
              problem={taper.data && !taper.data.ok ? taper.data.error : null} />
          )}
        </form>
        <PrintPlan body={sheetBody} blocked={sheetBody ? null : 'The sheet can be printed once the plan is worked out.'} />
      </div>
      <PlanView
        plan={plan}
        problem={problem}
        failure={main.error ? main.error.message : null}
        taper={taperPlan}
      />
    </div>
  );
}
