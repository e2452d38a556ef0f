import type { CuffPlan, HemPlan } from '@/lib/allowance/types';
import { LINE_NAMES } from './line-names';

interface Props {
  plan: CuffPlan | HemPlan;
}

/** The chalk lines top to bottom: how far below the pin mark, how far above the raw edge. */
export function ChalkLines({ plan }: Props) {
  const sloped = plan.kind === 'hem' && plan.slope.mm !== 0;
  return (
    <section aria-labelledby="lines-heading" className="break-inside-avoid">
      <h2 id="lines-heading" className="mb-2 text-xl font-extrabold">
        Chalk lines
      </h2>
      <table className="w-full border-collapse text-left text-lg">
        <thead>
          <tr className="border-b-2 border-ink text-base">
            <th scope="col" className="py-2 pr-2">
              Line
            </th>
            <th scope="col" className="py-2 pr-2">
              {sloped ? 'Below the mark, back' : 'Below the mark'}
            </th>
            {sloped && (
              <th scope="col" className="py-2 pr-2">
                Front
              </th>
            )}
            <th scope="col" className="py-2">
              Above the raw edge
            </th>
          </tr>
        </thead>
        <tbody>
          {plan.lines.map((l) => (
            <tr key={l.n} className={`border-b border-rule ${l.name === 'cut' ? 'text-cut' : ''}`}>
              <th scope="row" className="py-2 pr-2 font-semibold">
                <span className="mr-2 inline-flex size-8 items-center justify-center rounded-full border-2 border-current text-base">{l.n}</span>{' '}
                {LINE_NAMES[l.name]}
              </th>
              <td className="measure py-2 pr-2 text-2xl font-extrabold">{l.belowMark.text}</td>
              {sloped && 'frontBelowMark' in l && <td className="measure py-2 pr-2 text-2xl font-semibold">{l.frontBelowMark.text}</td>}
              <td className="measure py-2 text-xl">
                {!l.aboveRawEdge ? (
                  <span className="text-muted">—</span>
                ) : l.aboveRawEdge.mm < 0 ? (
                  <span className="font-semibold text-cut">past the raw edge</span>
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
