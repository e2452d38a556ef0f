import { useT } from '@/components/I18n';
import type { SleeveNoteCode, SleevePlan } from '@/lib/allowance/kind-types';
import type { SleeveFitting } from '@/lib/shared/fitting/sleeve-fitting';
import type { Len } from '@/lib/allowance/types';
import type { MessageKey } from '@/lib/shared/i18n/format';

// The notes that change or stop the usual work, drawn as warnings; the rest say how it is done.
const WARNINGS: ReadonlySet<SleeveNoteCode> = new Set([
  'vent-too-short-for-buttons',
  'working-buttonholes-shorten-at-shoulder',
  'vent-cut-away-shorten-at-shoulder',
  'buttonholes-closer-to-edge',
]);

const unsigned = (len: Len) => len.text.replace(/^[-−]\s*/, '');

// Above or below the present edge in words, never with a minus sign.
function fromEdge(t: ReturnType<typeof useT>, len: Len): string {
  if (len.mm === 0) return t('sleeve.onEdge');
  return len.mm > 0 ? t('sheet.above', { length: len.text }) : t('sheet.below', { length: unsigned(len) });
}

// A note's values as the catalog takes them: lengths as written, counts as numbers, a missing spacing as "none".
function noteValues(values: SleevePlan['notes'][number]['values']): Record<string, string | number> {
  const out: Record<string, string | number> = { spacing: 'none' };
  for (const [k, v] of Object.entries(values))
    out[k === 'spacingThatFits' ? 'spacing' : k] = typeof v === 'object' ? v.text : typeof v === 'boolean' ? String(v) : v;
  return out;
}

/** A jacket's or coat's sleeves at the bench (the adapter's plan, live as the fitting is typed): where to chalk and cut from the present edge, the buttons' moves, the vent, the lining, the notes. */
export function SleevePlanView({ plan: fitting }: { plan: SleeveFitting }) {
  const t = useT();
  const plan = fitting.plan;
  const cuff = plan.method === 'cuff' && plan.newEdgeAboveEdge && plan.cutAboveEdge;
  const lining = plan.lining.shortenBy;
  const top = plan.buttons.at(-1);
  return (
    <section aria-labelledby="sleeve-plan" data-testid="sleeve-plan" className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4">
      <h3 id="sleeve-plan" className="text-xl font-extrabold">
        {t('sleeve.heading')}
      </h3>
      <p data-testid="sleeve-method" className="text-lg font-semibold">
        {t('sleeve.method', { method: plan.method })}
      </p>
      {cuff ? (
        <table className="w-full text-left text-lg">
          <thead>
            <tr className="border-b-2 border-ink">
              <th scope="col">{t('sleeve.plan.col.line')}</th>
              <th scope="col" className="text-right">
                {t('sleeve.plan.col.fromEdge')}
              </th>
            </tr>
          </thead>
          <tbody>
            <tr data-testid="sleeve-line-new-edge" className="border-b border-rule">
              <th scope="row" className="font-semibold">
                <span className="font-extrabold">1 </span>
                {t('sleeve.line.new-edge')}
              </th>
              <td className="measure text-right text-3xl font-extrabold" data-mm={plan.newEdgeAboveEdge!.mm}>
                {fromEdge(t, plan.newEdgeAboveEdge!)}
              </td>
            </tr>
            <tr data-testid="sleeve-line-cut" className="border-b border-rule text-cut">
              <th scope="row" className="font-extrabold">
                <span>2 </span>
                {`${t('sleeve.plan.cut')} · ${t('sleeve.line.cut')}`}
                <span className="measure block text-base font-semibold">{t('sleeve.plan.cutHint', { hemDepth: plan.hemDepth.text })}</span>
              </th>
              <td className="measure text-right text-5xl font-extrabold" data-mm={plan.cutAboveEdge!.mm}>
                {fromEdge(t, plan.cutAboveEdge!)}
              </td>
            </tr>
          </tbody>
        </table>
      ) : (
        <p data-testid="sleeve-shoulder" className="measure text-2xl font-extrabold">
          {t('sleeve.plan.shoulder', { shortenBy: plan.shortenBy.text })}
        </p>
      )}
      {cuff && plan.buttons.length > 0 && (
        <table className="w-full text-left text-lg">
          <caption className="text-left text-lg font-extrabold">{t('sleeve.plan.buttons')}</caption>
          <thead>
            <tr className="border-b-2 border-ink">
              <th scope="col">{t('sleeve.plan.col.button')}</th>
              <th scope="col" className="text-right">
                {t('sleeve.plan.col.move')}
              </th>
              <th scope="col" className="text-right">
                {t('sleeve.plan.col.aboveNewEdge')}
              </th>
            </tr>
          </thead>
          <tbody>
            {plan.buttons.map((b) => (
              <tr key={b.n} data-testid={`sleeve-button-${b.n}`} className="border-b border-rule">
                <th scope="row" className="font-semibold">
                  {b.n}
                </th>
                <td className="measure text-right text-xl font-semibold">{`+ ${b.moveUp.text}`}</td>
                <td className="measure text-right text-2xl font-extrabold">{b.aboveNewEdge.text}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {plan.ventAfter && top && plan.ventRoom && (
        <p data-testid="sleeve-vent" className="measure text-lg">
          {t('sleeve.plan.vent', {
            fits: plan.ventRoom.mm >= 0 ? 'yes' : 'no',
            after: plan.ventAfter.text,
            room: plan.ventRoom.text,
            short: unsigned(plan.ventRoom),
          })}
        </p>
      )}
      <p data-testid="sleeve-lining" className="measure text-lg font-semibold">
        {t('sleeve.plan.lining', {
          way: lining.mm >= 0 ? 'shorten' : 'down',
          lining: unsigned(lining),
          fold: plan.lining.foldAboveEdge.text,
          pleat: plan.lining.easePleat.text,
        })}
      </p>
      <ul className="flex flex-col gap-2">
        {plan.notes.map((n) => (
          <li
            key={n.code}
            data-testid={`sleeve-note-${n.code}`}
            className={`rounded-md px-4 py-2 text-lg ${WARNINGS.has(n.code) ? 'border-l-8 border-warn bg-accent-soft font-semibold' : 'border-l-4 border-rule'}`}
          >
            {t(`sleeveNote.${n.code}` as MessageKey, noteValues(n.values))}
          </li>
        ))}
      </ul>
    </section>
  );
}
