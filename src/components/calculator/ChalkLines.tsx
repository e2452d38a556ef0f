import type { CuffPlan, HemPlan } from '@/lib/allowance/types';
import { useT } from '@/components/I18n';
import { lineName } from './line-names';

interface Props {
  plan: CuffPlan | HemPlan;
}

/** The chalk lines top to bottom: how far below the pin mark, how far above the raw edge. */
export function ChalkLines({ plan }: Props) {
  const sloped = plan.kind === 'hem' && plan.slope.mm !== 0;
  const t = useT();
  return (
    <section aria-labelledby="lines-heading" className="break-inside-avoid">
      <h2 id="lines-heading" className="mb-2 text-xl font-extrabold">
        {t('lines.heading')}
      </h2>
      <table className="w-full border-collapse text-left text-lg">
        <thead>
          <tr className="border-b-2 border-ink text-base">
            <th scope="col" className="py-2 pr-2">
              {t('taper.col.line')}
            </th>
            <th scope="col" className="py-2 pr-2">
              {sloped ? t('lines.col.belowBack') : t('lines.col.below')}
            </th>
            {sloped && (
              <th scope="col" className="py-2 pr-2">
                {t('lines.col.front')}
              </th>
            )}
            <th scope="col" className="py-2">
              {t('lines.col.above')}
            </th>
          </tr>
        </thead>
        <tbody>
          {plan.lines.map((l) => (
            <tr key={l.n} className={`border-b border-rule ${l.name === 'cut' ? 'text-cut' : ''}`}>
              <th scope="row" className="py-2 pr-2 font-semibold">
                <span className="mr-2 inline-flex size-8 items-center justify-center rounded-full border-2 border-current text-base">{l.n}</span>{' '}
                {lineName(t, l.name)}
              </th>
              <td className="measure py-2 pr-2 text-2xl font-extrabold">{l.belowMark.text}</td>
              {sloped && 'frontBelowMark' in l && <td className="measure py-2 pr-2 text-2xl font-semibold">{l.frontBelowMark.text}</td>}
              <td className="measure py-2 text-xl">
                {!l.aboveRawEdge ? (
                  <span className="text-muted">—</span>
                ) : l.aboveRawEdge.mm < 0 ? (
                  <span className="font-semibold text-cut">{t('lines.pastRaw')}</span>
                ) : (
                  l.aboveRawEdge.text
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
