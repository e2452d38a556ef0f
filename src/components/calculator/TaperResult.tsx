import type { TaperPlan } from '@/lib/allowance/types';
import { SeamWorkTable } from './SeamWorkTable';
import { TaperDrawing } from './TaperDrawing';

/** The taper check: the width to keep, and the let-out at each chalk line per seam and per side. */
export function TaperResult({ taper }: { taper: TaperPlan }) {
  return (
    <section aria-labelledby="taper-heading" className="flex flex-col gap-3 break-inside-avoid">
      <h2 id="taper-heading" className="text-xl font-extrabold">
        Tapered leg
      </h2>
      <p className="text-lg">
        Keep the width at the cuff top, <span className="measure font-extrabold">{taper.targetWidth.text}</span> flat, straight down to the cut.{' '}
        {taper.withinTolerance ? (
          <strong className="text-ok">Within tolerance: no seam work needed.</strong>
        ) : taper.feasible === false ? (
          <strong className="text-cut">The seam allowance is not enough for this let-out.</strong>
        ) : null}
      </p>
      <SeamWorkTable taper={taper} />
      <TaperDrawing taper={taper} />
    </section>
  );
}
