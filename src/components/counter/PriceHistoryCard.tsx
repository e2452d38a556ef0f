// The price list's history for the lead: who changed which line, when, and each old → new value.
import { useQuery } from '@tanstack/react-query';
import { FormMessage } from '@/components/Field';
import type { PriceChange } from '@/lib/shared/counter-views';
import { dateTimeText } from '@/lib/shared/date-text';
import { fetchJson } from '@/lib/shared/fetch-json';
import { formatMoney, type Currency } from '@/lib/pricing/money';

const FIELD: Record<PriceChange['changes'][number]['field'], string> = { name: 'name', amountMinor: 'price', rushApplies: 'rush applies', retired: 'retired' };

function shown(field: PriceChange['changes'][number]['field'], value: PriceChange['changes'][number]['from'], currency: Currency): string {
  if (value === null) return '—';
  if (field === 'amountMinor' && typeof value === 'number') return formatMoney(value, currency);
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return String(value);
}

/** The newest changes to the list first; added kinds show "—" as their old values. */
export function PriceHistoryCard({ currency }: { currency: Currency }) {
  const history = useQuery({ queryKey: ['price-history'], queryFn: () => fetchJson<PriceChange[]>('/api/prices/history') });
  return (
    <section aria-labelledby="history-h" className="rounded border-2 border-rule bg-card p-4">
      <h2 id="history-h" className="text-xl font-extrabold">
        Price list history
      </h2>
      {history.isPending && <p role="status">Loading the history…</p>}
      {history.error && <FormMessage kind="error">{history.error.message}</FormMessage>}
      {history.data?.length === 0 && <p className="mt-2 text-muted">No changes yet.</p>}
      {history.data && history.data.length > 0 && (
        <ul className="mt-2 flex flex-col gap-2" aria-label="Changes to the price list">
          {history.data.map((h) => (
            <li key={h.id} className="border-t border-rule pt-2" data-testid="price-change">
              <span className="font-semibold">{h.line}</span>
              {h.action === 'price-kind.added' ? ' added' : ''}:{' '}
              {h.changes.map((c) => `${FIELD[c.field]} ${shown(c.field, c.from, currency)} → ${shown(c.field, c.to, currency)}`).join('; ')}
              <div className="text-base text-muted">
                {h.actorName ?? 'Someone no longer on the staff'}, {dateTimeText(h.at)}
              </div>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
