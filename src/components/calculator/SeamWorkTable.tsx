import type { TaperPlan } from '@/lib/allowance/types';
import { useT } from '@/components/I18n';
import { lineName } from './line-names';
import { seamFigures } from './seam-figures';

/** The taper's seam work as a table: each chalk line's width now, the let-out at each seam and each side. */
export function SeamWorkTable({ taper }: { taper: TaperPlan }) {
  const t = useT();
  const verb = { 'let out': t('taper.letOut'), 'take in': t('taper.takeIn'), leave: t('taper.leave') } as const;
  return (
    <table className="w-full border-collapse text-left text-lg">
      <thead>
        <tr className="border-b-2 border-ink text-base">
          <th scope="col" className="py-2 pr-2">
            {t('taper.col.line')}
          </th>
          <th scope="col" className="py-2 pr-2">
            {t('taper.col.width')}
          </th>
          <th scope="col" className="py-2 pr-2">
            {t('taper.col.seam')}
          </th>
          <th scope="col" className="py-2">
            {t('taper.col.side')}
          </th>
        </tr>
      </thead>
      <tbody>
        {taper.lines.map((l) => {
          const work = seamFigures(l.change.mm, taper.unit, taper.precision);
          return (
            <tr key={l.n} className="border-b border-rule">
              <th scope="row" className="py-2 pr-2 font-semibold">
                {l.n} {lineName(t, l.name)}
              </th>
              <td className="measure py-2 pr-2">
                {l.width.text}
                {l.measured && <span className="block text-base text-muted">{t('taper.measured')}</span>}
              </td>
              <td className="py-2 pr-2">
                <span className="text-muted">{verb[work.verb]} </span>
                <span className="measure text-xl font-extrabold">{work.perSeam}</span>
              </td>
              <td className="measure py-2 text-xl font-semibold">{work.perSide}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
