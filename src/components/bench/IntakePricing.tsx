// Pricing at intake, for the counter and the lead: per garment the finish asked for (priced from the
// list as an estimate until the fitting) and the lead's kinds of work; rush for the ticket; and the
// estimate worked out with the same pure pricing as the server (lib/pricing), so it matches the ticket.
import type { AsJson } from '@/lib/shared/as-json';
import type { PriceListView } from '@/lib/shared/counter-views';
import { INTAKE_FINISHES } from '@/lib/shared/bench-requests';
import { KINDS, PART_LABELS } from '@/lib/shared/fitting/kinds';
import { workKeyOf } from '@/lib/shared/fitting/garment-kinds';
import type { ExistingFinish } from '@/lib/shared/existing-finish';
import { formatMoney } from '@/lib/pricing/money';
import { isRushableWork, priceTicket, sumMinor, type GarmentFacts, type PriceList } from '@/lib/pricing/price-lines';

type List = AsJson<PriceListView>;
const SELECT = 'min-h-12 rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent';

/** What the estimate needs of one garment as typed. */
export interface TypedGarment {
  description?: string;
  /** garments.kind: a skirt is priced by its own line, not by a finish */
  kind?: string;
  existingFinish?: ExistingFinish;
  finish?: string | null;
  work?: (string | undefined)[];
}

/** The "Finish asked for" choice and the kinds of work of one garment. */
export function GarmentPricing({
  index,
  kind = 'trousers',
  list,
  finish,
  work,
  onFinish,
  onWork,
}: {
  index: number;
  /** garments.kind: another kind than trousers has its own line instead of a finish */
  kind?: string;
  list: List | undefined;
  finish: string;
  work: string[];
  onFinish: (f: string) => void;
  onWork: (ids: string[]) => void;
}) {
  const kinds = list?.kinds.filter((k) => !k.retiredAt) ?? [];
  const id = `g-${index}-finish`;
  const workKey = workKeyOf(kind);
  const own = workKey ? list?.items.find((i) => i.key === workKey) : undefined;
  return (
    <div className="flex flex-col gap-3 sm:col-span-2 lg:col-span-6">
      {workKey ? (
        <p className="text-lg" data-testid={`g-${index}-kind-line`}>
          Priced by its own line: <strong>{own?.label ?? workKey}</strong>
          {own && list ? ` (${formatMoney(own.amountMinor, list.currency)})` : ''}
        </p>
      ) : (
        <div className="flex flex-col gap-1">
          <label htmlFor={id} className="font-semibold">
            Finish asked for (priced as an estimate)
          </label>
          <select id={id} value={finish} onChange={(e) => onFinish(e.target.value)} className={`${SELECT} sm:max-w-sm`}>
            <option value="">Not priced until the fitting</option>
            {INTAKE_FINISHES.map((f) => (
              <option key={f} value={f}>
                {f === 'original' ? KINDS.trousers.finishes.original.label : PART_LABELS[f]}
              </option>
            ))}
          </select>
        </div>
      )}
      {kinds.length > 0 && (
        <fieldset className="flex flex-wrap gap-x-5 gap-y-1">
          <legend className="font-semibold">Work from the price list: garment {index + 1}</legend>
          {kinds.map((k) => (
            <label key={k.id} className="inline-flex min-h-11 items-center gap-2 text-lg">
              <input
                type="checkbox"
                className="size-6"
                checked={work.includes(k.id)}
                onChange={(e) => onWork(e.target.checked ? [...work, k.id] : work.filter((w) => w !== k.id))}
              />
              {k.name} ({formatMoney(k.amountMinor, list!.currency)})
            </label>
          ))}
        </fieldset>
      )}
    </div>
  );
}

/** The ticket's estimate as it will be priced: lines by the list and `RUSH_RULE`, or null with nothing picked. */
export function intakeEstimate(
  list: List | undefined,
  garments: readonly TypedGarment[],
  rush: boolean,
): { total: number; rushed: boolean; lines: number } | null {
  if (!list) return null;
  const prices = Object.fromEntries(list.items.map((i) => [i.key, { label: i.label, amountMinor: i.amountMinor }])) as PriceList;
  const facts = garments.flatMap((g, i): GarmentFacts[] => {
    const finish = g.finish;
    const workKey = workKeyOf(g.kind);
    if (workKey) return [{ garmentId: String(i), label: g.description ?? '', finish: null, taperLetOut: false, oldCuff: false, workKey }];
    return finish === 'hem' || finish === 'cuff' || finish === 'original'
      ? [{ garmentId: String(i), label: g.description ?? '', finish, taperLetOut: false, oldCuff: g.existingFinish === 'cuff' }]
      : [];
  });
  const byId = new Map(list.kinds.map((k) => [k.id, k]));
  const kindLines = garments.flatMap((g) =>
    (g.work ?? [])
      .flatMap((id) => (id && byId.has(id) ? [byId.get(id)!] : []))
      .map((k) => ({ key: null, kindId: k.id, rushApplies: k.rushApplies, source: 'list', amountMinor: k.amountMinor })),
  );
  const priced = priceTicket(facts, prices, { rush, otherWork: kindLines.some(isRushableWork) });
  const lines = priced.lines.length + kindLines.length;
  if (lines === 0) return null;
  return { total: sumMinor(priced.lines) + sumMinor(kindLines), rushed: priced.lines.some((l) => l.key === 'rush'), lines };
}

/** The rush box and the estimate line under the garments. */
export function IntakeTotal({
  list,
  garments,
  rush,
  onRush,
}: {
  list: List | undefined;
  garments: readonly TypedGarment[];
  rush: boolean;
  onRush: (r: boolean) => void;
}) {
  const estimate = intakeEstimate(list, garments, rush);
  return (
    <div className="flex flex-col gap-2 sm:col-span-2">
      <label className="inline-flex min-h-11 items-center gap-2 text-lg font-semibold">
        <input type="checkbox" checked={rush} onChange={(e) => onRush(e.target.checked)} className="size-6" aria-describedby="intake-rush-hint" />
        Rush
      </label>
      <p id="intake-rush-hint" className="text-base text-muted">
        Rush is one surcharge per ticket with work on it that rush applies to.
      </p>
      <p className="text-lg" data-testid="intake-estimate">
        {estimate && list ? (
          <>
            Estimate: <span className="font-extrabold tabular-nums">{formatMoney(estimate.total, list.currency)}</span> ({estimate.lines} line
            {estimate.lines === 1 ? '' : 's'}
            {rush && !estimate.rushed ? '; rush needs work it applies to' : ''}). The fitting prices the finish again.
          </>
        ) : (
          'No price yet: pick a finish or work to price the ticket now, or price it after the fitting.'
        )}
      </p>
    </div>
  );
}
