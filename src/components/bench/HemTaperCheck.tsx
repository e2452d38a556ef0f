import type { TaperPlan } from '@/lib/allowance/types';
import { SeamWorkTable } from '@/components/calculator/SeamWorkTable';
import { Warnings } from '@/components/calculator/Warnings';

/** A plain hem's taper check at the bench: turned up, the hem must be as wide as the leg it lies against. */
export function HemTaperCheck({ taper }: { taper: TaperPlan }) {
  const [, cut] = taper.lines;
  if (!cut) return null;
  return (
    <section aria-labelledby="hem-taper-heading" data-testid="hem-taper" className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4">
      <h3 id="hem-taper-heading" className="text-xl font-extrabold">
        Tapered leg under a plain hem
      </h3>
      <p className="text-lg">
        Turned up, the hem lies against the leg <span className="measure font-extrabold">{cut.belowMark.text}</span> above the finished edge, where it is{' '}
        <span className="measure font-extrabold">{taper.targetWidth.text}</span> flat.{' '}
        {taper.withinTolerance ? (
          <strong className="text-ok">Within tolerance: the hem lies flat, no seam work needed.</strong>
        ) : taper.feasible === false ? (
          <strong className="text-cut">The seam allowance is not enough for this let-out.</strong>
        ) : null}
      </p>
      <SeamWorkTable taper={taper} />
      <Warnings warnings={taper.warnings} />
    </section>
  );
}
