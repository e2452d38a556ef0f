import { useT } from '@/components/I18n';
import type { OriginalHemPlan } from '@/lib/allowance/kind-types';
import type { Len } from '@/lib/allowance/types';
import type { Leg } from '@/lib/shared/measurement-request';
import type { MessageKey } from '@/lib/shared/i18n/format';

// Above the pin mark is said in words, never with a minus sign.
function fromMark(t: ReturnType<typeof useT>, len: Len): string {
  return len.mm < 0 ? t('sheet.above', { length: len.text.replace(/^[-−]\s*/, '') }) : t('sheet.below', { length: len.text });
}

/** Jeans kept on their factory hem at the bench: where to chalk (from the pin mark), the seam allowance taken twice, the taper at the join, the notes. */
export function OriginalHemPlanView({ leg, plan }: { leg: Leg; plan: OriginalHemPlan }) {
  const t = useT();
  const edge = plan.shortenBy.mm;
  const taper = plan.taper;
  return (
    <section
      aria-labelledby={`original-${leg}`}
      data-testid={`original-plan-${leg}`}
      className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4"
    >
      <h3 id={`original-${leg}`} className="text-xl font-extrabold">
        {t('original.heading')}
      </h3>
      <table className="w-full text-left text-lg">
        <thead>
          <tr className="border-b-2 border-ink">
            <th scope="col">{t('original.col.line')}</th>
            <th scope="col" className="text-right">
              {t('original.col.below')}
            </th>
          </tr>
        </thead>
        <tbody>
          {plan.lines.map((l, i) => {
            const cut = l.name === 'leg-cut' || l.name === 'band-cut';
            return (
              <tr key={l.name} data-testid={`original-line-${l.name}`} className={`border-b border-rule ${cut ? 'font-extrabold text-cut' : ''}`}>
                <td>
                  <span className="font-extrabold">{i + 1} </span>
                  {cut ? `${t('original.cut')} · ` : ''}
                  {t(`original.line.${l.name}` as MessageKey)}
                </td>
                <td className="measure text-right font-extrabold" data-mm={l.belowMark.mm - edge}>
                  {fromMark(t, l.belowMark)}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p data-testid={`original-sum-${leg}`} className="text-lg font-semibold">
        {plan.method === 'cut-and-join'
          ? t('original.sum', {
              shortenBy: plan.shortenBy.text,
              removed: plan.removed.text,
              seamAllowance: plan.seamAllowance.text,
              seamTakes: plan.seamTakes.text,
            })
          : t('original.foldSum', { shortenBy: plan.shortenBy.text, seamAllowance: plan.seamAllowance.text, seamTakes: plan.seamTakes.text })}
      </p>
      <p data-testid={`original-taper-${leg}`} className="text-lg">
        {!taper
          ? t('original.taper.none')
          : taper.withinTolerance
            ? t('original.taper.within', { mismatch: taper.mismatch.text.replace(/^[-−]\s*/, '') })
            : t('original.taper.work', { mismatch: taper.mismatch.text.replace(/^[-−]\s*/, '') })}
      </p>
      <ul className="flex flex-col gap-2">
        {plan.notes.map((n) => (
          <li key={n.code} data-testid={`original-note-${n.code}`} className="rounded-md border-l-8 border-warn bg-accent-soft px-4 py-2 text-lg font-semibold">
            {t(
              `originalNote.${n.code}` as MessageKey,
              Object.fromEntries(Object.entries(n.values).map(([k, v]) => [k, typeof v === 'object' && v && 'text' in v ? String(v.text) : String(v)])),
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}
