import { useRich, useT } from '@/components/I18n';
import type { CuffPlan, HemPlan } from '@/lib/allowance/types';
import { formatLength } from '@/lib/allowance/format-length';

interface Props {
  plan: CuffPlan | HemPlan;
}

/** Is there cloth enough below the mark? When there is not, NoFit says so instead, as the headline. */
export function ClothCheck({ plan }: Props) {
  const t = useT();
  const rich = useRich();
  const needs = rich('cloth.needs', { required: <span className="measure font-extrabold">{plan.required.text}</span> });
  if (plan.enough === null) {
    return (
      <p className="rounded-md border-2 border-rule bg-card px-4 py-3 text-lg break-inside-avoid">
        {needs} {t('cloth.typeIt')}
      </p>
    );
  }
  if (plan.enough) {
    return (
      <p className="rounded-md border-2 border-ok bg-ok-soft px-4 py-3 text-lg text-ok break-inside-avoid">
        <strong className="font-extrabold">{t('cloth.enough')}</strong> {needs}
        {plan.spare && <> {rich('cloth.spare', { spare: <span className="measure font-extrabold">{plan.spare.text}</span> })}</>}
      </p>
    );
  }
  return null;
}

// The cloth below the mark: above the raw edge plus below the mark at the first line (a hem's edge
// left below the mark for unwashed cloth is not at the mark).
function availableText(plan: CuffPlan | HemPlan): string | null {
  const first = plan.lines[0];
  if (!first?.aboveRawEdge) return null;
  if (first.belowMark.mm === 0) return first.aboveRawEdge.text;
  return formatLength(first.aboveRawEdge.mm + first.belowMark.mm, { unit: plan.unit, precision: plan.precision });
}

/** The cloth is short: said first, as the headline, then what still fits (the customer's cuff on a shorter third section first), then the figures. */
export function NoFit({ plan }: Props) {
  const t = useT();
  const rich = useRich();
  const m = (text: string | undefined) => <span className="measure font-extrabold">{text}</span>;
  const alt = plan.kind === 'cuff' ? plan.alternatives : null;
  return (
    <section
      aria-labelledby="nofit-heading"
      data-testid="no-fit"
      className="rounded-lg border-4 border-cut bg-cut-soft px-5 py-4 text-lg text-cut break-inside-avoid"
    >
      <h2 id="nofit-heading" className="text-3xl leading-tight font-extrabold">
        {rich('nofit.heading', { shortBy: <span className="measure">{plan.shortBy?.text}</span> })}
      </h2>
      {plan.kind === 'cuff' && alt && (
        <>
          <p className="mt-2 font-semibold text-ink">{t('nofit.stillFits')}</p>
          <ul className="ml-5 list-disc text-ink" data-testid="what-fits">
            {alt.shorterSection && (
              // The depth the customer chose, kept: only the hidden third section is shorter.
              <li>{rich('nofit.shorter', { depth: m(plan.cuffDepth.text), shorter: m(alt.shorterSection.text) })}</li>
            )}
            <li>{alt.deepestCuff ? rich('nofit.deepest', { deepest: m(alt.deepestCuff.text) }) : t('nofit.noShallower')}</li>
            <li>{rich('nofit.plain', { required: m(alt.plainHem.required.text), fits: alt.plainHem.fits ? 'yes' : 'no' })}</li>
            <li>{rich('nofit.faced', { required: m(alt.facedCuff.required.text), fits: alt.facedCuff.fits ? 'yes' : 'no' })}</li>
          </ul>
        </>
      )}
      <p className="mt-2">
        {rich('nofit.needs', {
          finish: plan.kind === 'cuff' ? 'cuff' : 'hem',
          required: m(plan.required.text),
          available: availableText(plan) === null ? 'none' : m(availableText(plan)!),
        })}
      </p>
    </section>
  );
}
