import type { TaperPlan } from '@/lib/allowance/types';
import { LINE_NAMES } from './line-names';
import { seamFigures } from './seam-figures';
import { TaperDrawing } from './TaperDrawing';

/** The taper check: the width to keep, and the let-out at each chalk line per seam and per side. */
export function TaperResult({ taper }: { taper: TaperPlan }) {
  return (
    <section aria-labelledby="taper-heading" className="flex flex-col gap-3 break-inside-avoid">
      <h2 id="taper-heading" className="text-xl font-extrabold">Tapered leg</h2>
      <p className="text-lg">
        Keep the width at the cuff top, <span className="measure font-extrabold">{taper.targetWidth.text}</span> flat, straight down to the cut.{' '}
        {taper.withinTolerance ? (
          <strong className="text-ok">Within tolerance: no seam work needed.</strong>
        ) : taper.feasible === false ? (
          <strong className="text-cut">The seam allowance is not enough for this let-out.</strong>
        ) : null}
      </p>
      <table className="w-full border-collapse text-left text-lg">
        <thead>
          <tr className="border-b-2 border-ink text-base">
            <th scope="col" className="py-2 pr-2">Line</th>
            <th scope="col" className="py-2 pr-2">Width now</th>
            <th scope="col" className="py-2 pr-2">At each seam</th>
            <th scope="col" className="py-2">Each side of the seam</th>
          </tr>
        </thead>
        <tbody>
          {taper.lines.map((l) => {
            const work = seamFigures(l.change.mm, taper.unit, taper.precision);
            return (
              <tr key={l.n} className="border-b border-rule">
                <th scope="row" className="py-2 pr-2 font-semibold">
                  {l.n} {LINE_NAMES[l.name]}
                </th>
                <td className="measure py-2 pr-2">{l.width.text}</td>
                <td className="py-2 pr-2">
                  <span className="text-muted">{work.verb} </span>
                  <span className="measure text-xl font-extrabold">{work.perSeam}</span>
                </td>
                <td className="measure py-2 text-xl font-semibold">{work.perSide}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <TaperDrawing taper={taper} />
    </section>
  );
}
