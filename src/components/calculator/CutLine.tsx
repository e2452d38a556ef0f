import { useRich, useT } from '@/components/I18n';
import type { CuffPlan, HemPlan } from '@/lib/allowance/types';

interface Props {
  plan: CuffPlan | HemPlan;
  stale: boolean;
}

/** The cutting line, large enough to read from the bench; greyed when it is not for what is typed. */
export function CutLine({ plan, stale }: Props) {
  const t = useT();
  const rich = useRich();
  const cut = plan.lines.find((l) => l.name === 'cut');
  if (!cut) return null;
  const front = plan.kind === 'hem' && plan.slope.mm !== 0 ? plan.lines.find((l) => l.name === 'cut')?.frontBelowMark : null;
  return (
    <section aria-labelledby="cut-heading" className={`rounded-lg border-4 bg-card px-5 py-4 break-inside-avoid ${stale ? 'border-rule' : 'border-cut'}`}>
      <h2 id="cut-heading" className={`text-lg font-extrabold tracking-wide uppercase ${stale ? 'text-muted' : 'text-cut'}`}>
        {t('cut.heading', { n: cut.n })}
      </h2>
      <p aria-live="polite" aria-atomic="true" className="flex flex-wrap items-baseline gap-x-4">
        <span data-testid="cut-line" className={`measure text-7xl leading-tight font-extrabold ${stale ? 'text-muted' : 'text-cut'}`}>
          {cut.belowMark.text}
        </span>
        <span className="text-2xl font-semibold">{t('cut.below', { sloped: front ? 'yes' : 'no' })}</span>
      </p>
      {front && <p className="text-2xl">{rich('cut.front', { length: <span className="measure font-extrabold">{front.text}</span> })}</p>}
      {cut.aboveRawEdge && cut.aboveRawEdge.mm >= 0 && (
        <p className="mt-1 text-lg text-muted">
          {rich('cut.aboveRaw', { length: <span className="measure font-semibold text-ink">{cut.aboveRawEdge.text}</span> })}
        </p>
      )}
    </section>
  );
}
