import { useT } from '@/components/I18n';
import type { PlanResponse } from '@/lib/shared/plan-request';
import type { TaperPlan } from '@/lib/allowance/types';
import { ChalkLines } from './ChalkLines';
import { ClothCheck, NoFit } from './ClothCheck';
import { CreaseNote } from './CreaseNote';
import { CutLine } from './CutLine';
import { FoldDrawing } from './FoldDrawing';
import { HemDrawing } from './HemDrawing';
import { TaperResult } from './TaperResult';
import { Warnings } from './Warnings';

const SAID_ELSEWHERE = new Set(['not-enough-cloth', 'old-crease-visible']);

/** Why there is no plan for what is typed right now. */
export interface Problem {
  text: string;
  /** 'empty': nothing to plan yet; 'error': a field needs fixing */
  kind: 'empty' | 'error';
}

interface Props {
  /** the plan for what is typed, or the last good one when there is a problem */
  plan: PlanResponse | null;
  problem: Problem | null;
  /** the calculator itself failed (network, server) */
  failure: string | null;
  taper: TaperPlan | null;
}

/** The plan for what is typed: the cutting line (or, short of cloth, what still fits) first, then the check, the lines, the drawing. */
export function PlanView({ plan, problem, failure, taper }: Props) {
  const t = useT();
  const main = plan && plan.kind !== 'taper' ? plan : null;
  const stale = problem !== null;
  return (
    <section aria-label={t('calc.plan')} className="flex flex-col gap-4">
      {failure && (
        <p role="alert" className="rounded-md border-2 border-cut bg-cut-soft px-4 py-3 text-lg font-semibold text-cut">
          {failure}
        </p>
      )}
      {main && problem && (
        <p role="alert" className="rounded-md border-l-8 border-cut bg-card px-4 py-3 text-lg font-semibold">
          {t('calc.stale', { problem: problem.text })}
        </p>
      )}
      {!main ? (
        <div
          role={problem?.kind === 'error' ? 'alert' : undefined}
          className={
            'rounded-lg border-2 px-5 py-8 text-xl ' +
            (problem?.kind === 'error' ? 'border-cut bg-cut-soft font-semibold text-cut' : 'border-dashed border-rule bg-card text-muted')
          }
        >
          {problem?.text ?? t('calc.working')}
        </div>
      ) : (
        // Stale: drained of colour, not faded, so every word keeps its contrast (issue 15); the alert above says why.
        <div className={`flex flex-col gap-4 ${stale ? 'grayscale' : ''}`}>
          {/* Short of cloth, the headline is that it does not fit and what would; never a line to cut at. */}
          {main.enough === false ? <NoFit plan={main} /> : <CutLine plan={main} stale={stale} />}
          <ClothCheck plan={main} />
          {/* ClothCheck and CreaseNote already say these, with more beside them. */}
          <Warnings warnings={[...main.warnings, ...(taper?.warnings ?? [])].filter((w) => !SAID_ELSEWHERE.has(w.code))} />
          <ChalkLines plan={main} />
          {main.kind === 'cuff' ? <FoldDrawing plan={main} /> : <HemDrawing plan={main} />}
          {main.kind === 'cuff' && main.creaseLands && <CreaseNote crease={main.creaseLands} />}
          {taper && <TaperResult taper={taper} />}
        </div>
      )}
    </section>
  );
}
