import { useState, type SubmitEvent } from 'react';
import { useLanguage, useT } from '@/components/I18n';
import type { Language } from '@/lib/shared/i18n/languages';
import type { Translate } from '@/lib/shared/i18n/format';
import type { Precision, Unit } from '@/lib/allowance/types';
import { catalogLengthWords } from '@/lib/shared/i18n/check-words';
import { checkPlanRequest, type LengthWords } from '@/lib/shared/plan-check';
import type { PlanRequestInput } from '@/lib/shared/plan-request';
import { BLANK, LENGTH_FIELDS, mainRequest, taperRequest, type CalculatorValues, type LengthField } from './calculator-values';
import { convertTyped, readLength } from '@/lib/shared/length-reading';
import { CuffFields } from './CuffFields';
import { HemFields } from './HemFields';
import type { Bind, FieldInfo } from './LengthField';
import { PlanView, type Problem } from './PlanView';
import { PrintPlan } from './PrintPlan';
import { refusalWords } from './refusal-words';
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

function serverMessage(t: Translate, language: Language, answer: PlanAnswer | undefined, field: string): string | undefined {
  return answer && !answer.ok ? refusalWords(t, answer, language).issues[field] : undefined;
}

/** The server's own rules, checked in the browser: a message per field of the request, or none. */
function ownMessages(request: PlanRequestInput | null, say: LengthWords): Record<string, string> {
  const checked = request ? checkPlanRequest(request, say) : null;
  return checked && !checked.ok ? checked.issues : {};
}

/** Fields whose text could not be carried to the new unit: the text left, and the unit it was typed in. */
type Unconverted = Partial<Record<LengthField, { text: string; from: Unit }>>;

/** The form on the left, the plan on the right; the plan follows the typing a quarter-second behind. */
export function CalculatorForm() {
  const t = useT();
  const language = useLanguage();
  const unitWords = (u: Unit) => t(`calc.unit.${u}`);
  const [values, setValues] = useState<CalculatorValues>(BLANK);
  // A field's own message shows once it has been typed in (or the form was submitted), as it is typed.
  const [typedIn, setTypedIn] = useState<ReadonlySet<LengthField>>(() => new Set());
  const settled = useDebounced(values, 250);
  const [taperOpen, setTaperOpen] = useState(false);
  const [unconverted, setUnconverted] = useState<Unconverted>({});

  const main = usePlan(mainRequest(settled));
  const taper = usePlan(taperOpen ? taperRequest(settled) : null);

  const plan = useLastGoodPlan(main, values.kind);

  const setField = (f: LengthField, text: string) => {
    setValues((v) => ({ ...v, [f]: text }));
    setTypedIn((seen) => (seen.has(f) ? seen : new Set(seen).add(f)));
  };
  const bind: Bind = (f) => ({ name: f, value: values[f], onChange: (e) => setField(f, e.target.value) });

  // Checked as typed, with the server's rules and words; the engine's own (what a length means) come from the answer.
  const say = catalogLengthWords(t);
  const own = { ...(taperOpen ? ownMessages(taperRequest(values), say) : {}), ...ownMessages(mainRequest(values), say) };
  const errorFor = (f: LengthField): string | undefined =>
    (typedIn.has(f) ? own[f] : undefined) ?? serverMessage(t, language, main.data, f) ?? (taperOpen ? serverMessage(t, language, taper.data, f) : undefined);

  const setScale = (s: Scale) => {
    const unit: Unit = s === 'in8' || s === 'in16' ? 'in' : s;
    const precision: Precision = s === 'in16' ? 16 : 8;
    const next: CalculatorValues = { ...values, unit, precision };
    if (unit !== values.unit) {
      // A length typed in the old unit keeps its meaning, written as the new unit writes it
      // ("1 1/2" in inches becomes "3.8" in cm); what cannot be read stays as typed, flagged.
      const left: Unconverted = {};
      for (const f of LENGTH_FIELDS) {
        const carried = convertTyped(values[f], values.unit, unit, precision);
        if (carried.ok) {
          next[f] = carried.text;
          continue;
        }
        // Flagged until it is retyped, or until the unit it was typed in comes back.
        const from = unconverted[f]?.text === values[f] ? unconverted[f].from : values.unit;
        if (from !== unit) left[f] = { text: values[f], from };
      }
      setUnconverted(left);
    }
    setValues(next);
  };

  const info: FieldInfo = (f) => {
    const left = unconverted[f]?.text === values[f] ? unconverted[f] : undefined;
    return {
      reading: readLength(values[f], values.unit, values.precision),
      note: left ? t('calc.leftAsTyped', { from: unitWords(left.from), to: unitWords(values.unit) }) : null,
    };
  };

  const setKind = (kind: CalculatorValues['kind']) => {
    // The other finish's fields start afresh: no message until typed in.
    setTypedIn(new Set());
    setValues((v) => ({ ...v, kind }));
  };

  // Enter in a field: every message shows, and the first field at fault takes the focus.
  const onSubmit = (e: SubmitEvent<HTMLFormElement>) => {
    e.preventDefault();
    setTypedIn(new Set(LENGTH_FIELDS));
    const first = LENGTH_FIELDS.find((f) => own[f] ?? serverMessage(t, language, main.data, f));
    if (first) document.getElementById(`f-${first}`)?.focus();
  };

  const blankDepth = settled.kind === 'cuff' && settled.cuffDepth.trim() === '';
  const problem: Problem | null = !main.asked
    ? blankDepth
      ? { kind: 'empty', text: t('calc.problem.empty') }
      : { kind: 'error', text: t('calc.problem.fix') }
    : main.data && !main.data.ok
      ? { kind: 'error', text: refusalWords(t, main.data, language).error }
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
            ? {
                taper: {
                  widthAtEdge: taperAsked.widthAtEdge,
                  widthAbove: taperAsked.widthAbove,
                  heightAbove: taperAsked.heightAbove,
                  seamAllowance: taperAsked.seamAllowance,
                },
              }
            : {}),
        };

  return (
    // Words without tabular figures (tabular hyphens gape); lengths turn them back on with `measure`.
    // On paper the form is hidden and the plan takes the whole width, whatever the screen was.
    <div className="grid items-start gap-6 [font-feature-settings:'cv11'_1] lg:grid-cols-[minmax(0,27rem)_minmax(0,1fr)] print:block">
      <div className="flex flex-col gap-6 print:hidden">
        <form aria-label={t('calc.form')} noValidate onSubmit={onSubmit} className="flex flex-col gap-5 rounded-lg border-2 border-rule bg-card p-4">
          <Segmented
            name="finish"
            legend={t('calc.finish')}
            value={values.kind}
            onChange={setKind}
            options={[
              { value: 'cuff', label: t('calc.finish.cuff') },
              { value: 'hem', label: t('calc.finish.hem') },
            ]}
          />
          <Segmented name="scale" legend={t('calc.measureIn')} value={toScale(values.unit, values.precision)} onChange={setScale} options={SCALES} />
          {values.kind === 'cuff' ? (
            <CuffFields bind={bind} unit={unitLabel} errorFor={errorFor} info={info} cuffDepth={values.cuffDepth} onPick={(v) => setField('cuffDepth', v)} />
          ) : (
            <HemFields bind={bind} unit={unitLabel} errorFor={errorFor} info={info} />
          )}
          {values.kind === 'cuff' && (
            <TaperFields
              open={taperOpen}
              onToggle={setTaperOpen}
              bind={bind}
              unit={unitLabel}
              errorFor={errorFor}
              info={info}
              waiting={taperOpen && !taper.asked}
              problem={taper.data && !taper.data.ok ? refusalWords(t, taper.data, language).error : null}
            />
          )}
        </form>
        <PrintPlan body={sheetBody} blocked={sheetBody ? null : t('calc.printBlocked')} />
      </div>
      <PlanView plan={plan} problem={problem} failure={main.error ? main.error.message : null} taper={taperPlan} />
    </div>
  );
}
