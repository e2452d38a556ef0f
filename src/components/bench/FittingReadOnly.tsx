import { useState } from 'react';
import { Segmented } from '@/components/calculator/Segmented';
import { shopReading, typedWithUnit } from '@/lib/shared/length-reading';
import type { Precision, Unit } from '@/lib/allowance/types';
import type { FittingView } from '@/lib/shared/bench-types';
import { FINISH_LABELS, LEG_LENGTH_LABELS, LEG_LENGTHS, LEGS, legFormValues, type Leg } from '@/lib/shared/measurement-request';
import { WaistNoteLine } from './WaistNoteLine';
import { isLengthField, valueWords } from '@/lib/shared/fitting/kinds';
import { LegPlan } from './LegPlan';

interface Props {
  fitting: FittingView;
  precision: Precision;
  unit: Unit;
  /** the pair is let down first: the width measured at the cut is used in the plan */
  letDown?: boolean;
}

/** A saved length as typed, in its own unit, and below it what it reads as in the shop's unit. */
function SavedLengthText({ text, typedIn, unit, precision }: { text: string; typedIn: Unit; unit: Unit; precision: Precision }) {
  const read = shopReading(text, typedIn, unit, precision);
  return (
    <>
      <span className="whitespace-nowrap">{typedWithUnit(text, typedIn)}</span>
      {read && <span className="block text-base font-semibold whitespace-nowrap text-muted">= {read}</span>}
    </>
  );
}

/** Both legs' saved measurements side by side, to read, and the chosen leg's plan. */
export function FittingReadOnly({ fitting, precision, unit, letDown = false }: Props) {
  const [leg, setLeg] = useState<Leg>('left');
  const byLeg = new Map(fitting.legs.map((l) => [l.leg, l]));
  if (fitting.legs.length === 0) {
    return (
      <p className="rounded-lg border-2 border-dashed border-rule bg-card px-5 py-6 text-xl text-muted">
        No fitting measurements yet: the tailor takes them at the fitting.
      </p>
    );
  }
  const shownUnit = fitting.legs[0]?.unit ?? unit;
  const taken = LEG_LENGTHS.filter((f) => LEGS.some((l) => byLeg.get(l)?.values[f]));
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,30rem)_minmax(0,1fr)]">
      <section aria-labelledby="readonly-heading" className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4">
        <h2 id="readonly-heading" className="text-2xl font-extrabold">
          Fitting measurements
        </h2>
        <p className="text-base text-muted">To read only: the tailor changes them.</p>
        <table className="w-full border-collapse text-left text-lg">
          <thead>
            <tr className="border-b-2 border-ink text-base">
              <th scope="col" className="py-2 pr-2">
                Measurement
              </th>
              <th scope="col" className="py-2 pr-2">
                Left
              </th>
              <th scope="col" className="py-2">
                Right
              </th>
            </tr>
          </thead>
          <tbody>
            <tr className="border-b border-rule">
              <th scope="row" className="py-2 pr-2 font-semibold">
                Finish
              </th>
              {LEGS.map((l) => (
                <td key={l} className="py-2 pr-2 text-xl font-bold">
                  {byLeg.get(l) ? FINISH_LABELS[byLeg.get(l)!.finish] : '—'}
                </td>
              ))}
            </tr>
            {LEGS.some((l) => byLeg.get(l)?.preset) && (
              <tr className="border-b border-rule">
                <th scope="row" className="py-2 pr-2 font-semibold">
                  Preset
                </th>
                {LEGS.map((l) => (
                  <td key={l} className="py-2 pr-2 text-lg font-semibold">
                    {byLeg.get(l)?.preset ?? '—'}
                  </td>
                ))}
              </tr>
            )}
            {taken.map((f) => (
              <tr key={f} className="border-b border-rule">
                <th scope="row" className="py-2 pr-2 font-semibold">
                  {LEG_LENGTH_LABELS[f]}
                </th>
                {LEGS.map((l) => {
                  const v = byLeg.get(l)?.values[f];
                  return (
                    <td key={l} className="measure py-2 pr-2 text-2xl font-extrabold">
                      {!v ? (
                        <span className="text-muted">—</span>
                      ) : isLengthField(f) ? (
                        <SavedLengthText text={v.text} typedIn={shownUnit} unit={unit} precision={precision} />
                      ) : (
                        valueWords(f, v.text)
                      )}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
        <Segmented
          name="plan-leg"
          legend="Plan for"
          value={leg}
          onChange={setLeg}
          options={LEGS.map((l) => ({ value: l, label: l === 'left' ? 'Left leg' : 'Right leg' }))}
        />
      </section>
      <div className="flex flex-col gap-4">
        <WaistNoteLine note={fitting.waist?.[leg]} />
        <LegPlan leg={leg} values={legFormValues(byLeg.get(leg))} unit={shownUnit} precision={precision} letDown={letDown} />
      </div>
    </div>
  );
}
