import type { TaperPlan } from '@/lib/allowance/types';
import { LINE_NAMES } from '@/components/calculator/line-names';
import { seamFigures } from '@/components/calculator/seam-figures';
import { Warnings } from '@/components/calculator/Warnings';


/** A plain hem's taper check at the bench: turned up, the hem must be as wide as the leg it lies against. */
export function HemTaperCheck({ taper }: { taper: TaperPlan }) {
  const [, cut] = taper.lines;
  if (!cut) return null;
  return (
    <section aria-labelledby="hem-taper-heading" data-testid="hem-taper" className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4">
      <h3 id="hem-taper-heading" className="text-xl font-extrabold">Tapered leg under a plain hem</h3>
      <p className="text-lg">
        Turned up, the hem lies against the leg <span className="measure font-extrabold">{cut.belowMark.text}</span> above the finished edge, where it is{' '}
        <span className="measure font-extrabold">{taper.targetWidth.text}</span> flat.{' '}
        {taper.withinTolerance ? (
          <strong className="text-ok">Within tolerance: the hem lies flat, no seam work needed.</strong>
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
              <td className="measure py-2 pr-2">
                {l.width.text}
                {l.measured && <span className="block text-base text-muted">measured</span>}
              </td>
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
      <Warnings warnings={taper.warnings} />
    </section>
  );
}
