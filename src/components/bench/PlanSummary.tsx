import { useRich, useT } from '@/components/I18n';
import { warningText } from '@/lib/shared/i18n/engine-messages';
import type { CuffPlan, HemPlan, PlanWarning } from '@/lib/allowance/types';
import type { OriginalHemPlan } from '@/lib/allowance/kind-types';
import type { MessageKey } from '@/lib/shared/i18n/format';
import type { Leg } from '@/lib/shared/measurement-request';
import type { LegPlanState } from './use-leg-plan';
import { worstWarning } from './worst-warning';
import type { ReactNode } from 'react';

interface Props {
  leg: Leg;
  planned: LegPlanState;
}

function Cloth({ plan }: { plan: CuffPlan | HemPlan }) {
  const t = useT();
  if (plan.enough === null) return <span className="text-base text-muted">{t('summary.notChecked')}</span>;
  return (
    <span className="text-base font-bold text-ok">
      <span aria-hidden="true">✓ </span>
      {t('summary.enough')}
    </span>
  );
}

/** The bar's frame: kept at the top, labelled by the leg, its first line led by the leg's name, `below` under it. */
function SummaryBar({ leg, t, line, below }: { leg: Leg; t: ReturnType<typeof useT>; line: ReactNode; below: ReactNode }) {
  return (
    <div
      role="region"
      aria-label={t('summary.region', { leg })}
      data-testid="plan-summary"
      className="sticky top-0 z-20 -mx-4 flex flex-col border-b-4 border-ink bg-card px-4 py-1.5 shadow-md sm:mx-0 sm:rounded-b-lg sm:border-x-2"
    >
      <p className="flex flex-wrap items-baseline gap-x-2.5">
        <span className="text-sm font-extrabold tracking-wide uppercase">{t('summary.leg', { leg })}</span>
        {line}
      </p>
      {below}
    </div>
  );
}

// A kept factory hem in the bar: where the leg is cut (from the pin mark) and its first note beyond the chalking.
function OriginalSummary({ leg, plan, t }: { leg: Leg; plan: OriginalHemPlan; t: ReturnType<typeof useT> }) {
  const legCut = plan.lines.find((l) => l.name === 'leg-cut');
  const fold = plan.lines.find((l) => l.name === 'fold');
  const line = legCut ?? fold;
  const notes = plan.notes.filter((n) => n.code !== 'chalk-on-both-legs');
  const words = (v: unknown) => (typeof v === 'object' && v && 'text' in v ? String((v as { text: string }).text) : String(v));
  const first = notes[0];
  return (
    <SummaryBar
      leg={leg}
      t={t}
      line={
        <>
          {line && (
            <>
              <span className="text-lg font-semibold">{t(line.name === 'fold' ? 'original.line.fold' : 'original.line.leg-cut')}</span>
              <span data-testid="summary-cut" className="measure text-4xl leading-tight font-extrabold text-cut">
                {line.belowMark.mm < 0
                  ? t('sheet.above', { length: line.belowMark.text.replace(/^[-−]\s*/, '') })
                  : t('sheet.below', { length: line.belowMark.text })}
              </span>
            </>
          )}
        </>
      }
      below={
        <>
          {first && (
            <p className="text-base font-semibold">
              <span data-testid="summary-warning" className="min-w-0 truncate text-warn">
                <span aria-hidden="true">⚠ </span>
                {t(`originalNote.${first.code}` as MessageKey, Object.fromEntries(Object.entries(first.values).map(([k, v]) => [k, words(v)])))}
              </span>
            </p>
          )}
        </>
      }
    />
  );
}

/**
 * The leg's plan in one short bar that stays at the top of the screen while the fields are typed
 * (the full plan stays below or beside): where to cut, whether the cloth is enough, the worst
 * warning. Short on purpose: at 390 px the on-screen keyboard leaves little room above the field.
 */
export function PlanSummary({ leg, planned }: Props) {
  const { plan, problem, failure, taper, taperProblem, original } = planned;
  const t = useT();
  const rich = useRich();
  if (original) return <OriginalSummary leg={leg} plan={original} t={t} />;
  const main = plan && plan.kind !== 'taper' ? plan : null;
  const stale = problem !== null;
  const cut = main?.lines.find((l) => l.name === 'cut');
  const say = { warning: (w: PlanWarning) => warningText(t, w), taper: (problem: string) => t('summary.taperCheck', { problem }) };
  const worst = main
    ? worstWarning([...main.warnings, ...(taper?.warnings ?? [])], taperProblem, say)
    : taperProblem
      ? worstWarning([], taperProblem, say)
      : null;
  return (
    <SummaryBar
      leg={leg}
      t={t}
      line={
        <>
          {failure ? (
            <span className="text-lg font-semibold text-cut">{failure}</span>
          ) : !main ? (
            <span className={`text-lg ${problem?.kind === 'error' ? 'font-semibold text-cut' : 'text-muted'}`}>{problem?.text ?? t('calc.working')}</span>
          ) : main.enough === false ? (
            // Short of cloth there is no line to cut at, here as in the full plan.
            <span data-testid="summary-no-fit" className="text-2xl font-extrabold text-cut">
              {rich('summary.noFit', { shortBy: <span className="measure">{main.shortBy?.text}</span> })}
            </span>
          ) : (
            cut && (
              <>
                <span className="text-lg font-semibold">{t('summary.cut')}</span>
                <span data-testid="summary-cut" className={`measure text-4xl leading-tight font-extrabold ${stale ? 'text-muted' : 'text-cut'}`}>
                  {cut.belowMark.text}
                </span>
                <span className="text-base">{t('summary.belowMark')}</span>
              </>
            )
          )}
        </>
      }
      below={
        <>
          {(main || worst) && (
            <p className="flex min-w-0 items-baseline gap-x-3 text-base font-semibold">
              {main && stale ? (
                <span className="shrink-0 text-cut">{t('summary.stale')}</span>
              ) : main && main.enough !== false ? (
                <span className="shrink-0">
                  <Cloth plan={main} />
                </span>
              ) : null}
              {worst && (
                <span data-testid="summary-warning" className="min-w-0 truncate text-warn md:line-clamp-2 md:whitespace-normal">
                  <span aria-hidden="true">⚠ </span>
                  {worst.message}
                  {worst.others > 0 && <span className="text-muted">{t('summary.more', { n: worst.others })}</span>}
                </span>
              )}
            </p>
          )}
        </>
      }
    />
  );
}
