import { useRich, useT } from '@/components/I18n';
import type { TaperPlan } from '@/lib/allowance/types';
import { SeamWorkTable } from './SeamWorkTable';
import { TaperDrawing } from './TaperDrawing';

/** The taper check: the width to keep, and the let-out at each chalk line per seam and per side. */
export function TaperResult({ taper }: { taper: TaperPlan }) {
  const t = useT();
  const rich = useRich();
  return (
    <section aria-labelledby="taper-heading" className="flex flex-col gap-3 break-inside-avoid">
      <h2 id="taper-heading" className="text-xl font-extrabold">
        {t('taper.heading')}
      </h2>
      <p className="text-lg">
        {rich('taper.keep', { width: <span className="measure font-extrabold">{taper.targetWidth.text}</span> })}{' '}
        {taper.withinTolerance ? (
          <strong className="text-ok">{t('taper.within')}</strong>
        ) : taper.feasible === false ? (
          <strong className="text-cut">{t('taper.notEnough')}</strong>
        ) : null}
      </p>
      <SeamWorkTable taper={taper} />
      <TaperDrawing taper={taper} />
    </section>
  );
}
