// A skirt's or dress's live plan on the garment page: the deepest hem that lies flat, the fullness
// to ease at the depth asked, how to finish it (turned, narrower, rolled, faced), and the new hem
// line against the old edge at each place round the hem. The engine's notes in the catalog's words.
import { useT } from '@/components/I18n';
import type { SkirtPlan } from '@/lib/shared/fitting/skirt-fitting';
import { noteValues } from '@/lib/shared/i18n/kind-notes';
import type { MessageKey } from '@/lib/shared/i18n/format';

const unsigned = (text: string) => text.replace(/^[-−]\s*/, '');

/** The skirt's plan, as the engine gives it while the fitting is typed. */
export function SkirtPlanView({ plan }: { plan: SkirtPlan }) {
  const t = useT();
  const f = plan.flared;
  const depth = (f.finishDepth ?? f.hemDepth).text;
  const notes = [
    ...f.notes.map((n) => t(`skirtNote.${n.code}` as MessageKey, noteValues(t, n.values))),
    ...(plan.level?.notes ?? []).map((n) => t(`levelNote.${n.code}` as MessageKey, noteValues(t, n.values))),
  ];
  return (
    <section aria-labelledby="skirt-plan-heading" data-testid="skirt-plan" className="flex flex-col gap-3 rounded-lg border-2 border-ink bg-card p-4">
      <h3 id="skirt-plan-heading" className="text-xl font-extrabold">
        {t('skirt.plan.heading')}
      </h3>
      <p data-testid="skirt-finish" className="text-xl font-bold">
        {t(`skirt.finish.${f.finish}` as MessageKey, { depth, asked: f.hemDepth.text })}
      </p>
      <p data-testid="skirt-lies-flat" className="text-lg">
        {f.liesFlatTo ? t('skirt.plan.liesFlat', { depth: f.liesFlatTo.text }) : t('skirt.plan.anyDepth')}
      </p>
      {f.shape !== 'straight' && (
        <p data-testid="skirt-fullness" className="text-lg">
          {t('skirt.plan.fullness', { depth: f.hemDepth.text, fullness: unsigned(f.fullness.text), percent: Math.round(f.easePercent * 10) / 10 })}
        </p>
      )}
      {plan.level && (
        <>
          <p data-testid="skirt-level" className="text-lg font-semibold">
            {t('skirt.plan.level', { below: plan.level.newLineBelowPins.text })}
          </p>
          {/* Five columns do not fit a phone: the table scrolls in its own region (named, and reachable
              with the keyboard so it can be scrolled without a pointer), never the page. */}
          {/* biome-ignore lint/a11y/useSemanticElements: a scroller within the plan's section, not a section of the page */}
          <div
            role="region"
            aria-label={t('skirt.plan.points')}
            // biome-ignore lint/a11y/noNoninteractiveTabindex: a scrolling region must take focus to be scrolled by keyboard (WCAG 2.1.1)
            tabIndex={0}
            data-testid="skirt-points-region"
            className="max-w-full overflow-x-auto rounded focus-visible:outline-4 focus-visible:outline-offset-2 focus-visible:outline-accent"
          >
            <table className="w-full text-left text-lg" data-testid="skirt-points">
              <thead>
                <tr className="border-b-2 border-ink">
                  <th scope="col" className="py-1 pr-3">
                    {t('skirt.plan.col.place')}
                  </th>
                  <th scope="col" className="py-1 pr-3">
                    {t('skirt.plan.col.pin')}
                  </th>
                  <th scope="col" className="py-1 pr-3">
                    {t('skirt.plan.col.newLine')}
                  </th>
                  <th scope="col" className="py-1 pr-3">
                    {t('skirt.plan.col.cut')}
                  </th>
                  <th scope="col" className="py-1">
                    {t('skirt.plan.col.spare')}
                  </th>
                </tr>
              </thead>
              <tbody>
                {plan.level.points.map((p) => (
                  <tr key={p.at} data-point={p.at} className="border-b border-rule">
                    <th scope="row" className="py-1 pr-3 font-semibold">
                      {t(`skirt.place.${p.at}` as MessageKey)}
                    </th>
                    <td className="py-1 pr-3 tabular-nums">{p.pinAboveEdge.text}</td>
                    <td className="py-1 pr-3 tabular-nums">
                      {p.newLineAboveEdge.mm > 0
                        ? t('skirt.plan.shorten', { length: p.newLineAboveEdge.text })
                        : p.newLineAboveEdge.mm < 0
                          ? t('skirt.plan.letDown', { length: unsigned(p.newLineAboveEdge.text) })
                          : t('skirt.plan.same')}
                    </td>
                    <td className="py-1 pr-3 tabular-nums">{p.cutAboveEdge.text}</td>
                    <td className={`py-1 tabular-nums ${p.enough === false ? 'font-extrabold text-cut' : ''}`}>{p.spare?.text ?? '—'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
      {notes.length > 0 && (
        <ul className="flex flex-col gap-2">
          {notes.map((n, i) => (
            <li key={i} className="rounded-md border-l-8 border-warn bg-accent-soft px-4 py-2 text-lg font-semibold">
              {n}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
