import { useQuery } from '@tanstack/react-query';
import type { PreviousFitting } from '@/lib/shared/customer-types';
import { dateTimeText } from '@/lib/shared/date-text';
import { fetchJson } from '@/lib/shared/fetch-json';
import { FINISH_LABELS } from '@/lib/shared/measurement-request';

/** The customer's earlier fittings (GET /api/customers/[id]/fittings), shared by every garment row. */
export function usePreviousFittings(customerId: string | null) {
  return useQuery({
    queryKey: ['previous-fittings', customerId],
    queryFn: () => fetchJson<PreviousFitting[]>(`/api/customers/${customerId}/fittings`),
    enabled: Boolean(customerId),
  });
}

/** One leg (or both, when alike) as the offer reads: finish, finished length, cuff depth, preset. */
function legsText(f: PreviousFitting): string {
  const say = (l: PreviousFitting['legs'][number]) =>
    [
      FINISH_LABELS[l.finish],
      l.finishedLength && `finished length ${l.finishedLength} ${f.unit}`,
      l.cuffDepth && l.finish === 'cuff' && `cuff ${l.cuffDepth} ${f.unit}`,
      l.preset && `preset ${l.preset}`,
    ]
      .filter(Boolean)
      .join(', ');
  const [left, right] = [f.legs.find((l) => l.leg === 'left'), f.legs.find((l) => l.leg === 'right')];
  if (left && right && say(left) !== say(right)) return `left: ${say(left)}; right: ${say(right)}`;
  return say((left ?? right)!);
}

interface Props {
  /** which garment this offer is for, to name the buttons apart */
  garmentLabel: string;
  fittings: PreviousFitting[];
  chosen: string | null | undefined;
  onChoose: (garmentId: string | null) => void;
}

/** "Same as last time": the customer's earlier fittings per garment kind, one tap to copy one into
 * this garment's fitting (a second tap takes it back). Nothing shows for a customer without one. */
export function SameAsLastTime({ garmentLabel, fittings, chosen, onChoose }: Props) {
  if (fittings.length === 0) return null;
  return (
    <div role="group" aria-label={`Same as last time: ${garmentLabel}`} className="flex flex-col gap-2 rounded border-2 border-dashed border-rule bg-paper p-3">
      <p className="font-semibold">Same as last time?</p>
      {fittings.map((f) => {
        const on = chosen === f.garmentId;
        return (
          <button
            key={f.garmentId}
            type="button"
            aria-pressed={on}
            onClick={() => onChoose(on ? null : f.garmentId)}
            className="min-h-11 rounded border-2 border-accent bg-card px-3 py-2 text-left text-base aria-pressed:bg-accent-soft aria-pressed:font-semibold [overflow-wrap:anywhere]"
          >
            {on ? 'Copied: ' : 'Copy: '}
            {f.description} ({f.ticketLabel}, {dateTimeText(f.takenAt)}) — {legsText(f)}
          </button>
        );
      })}
      {chosen && (
        <p className="text-sm text-muted">The fitting is copied into this garment when the ticket is opened; the bench checks it at the fitting as usual.</p>
      )}
    </div>
  );
}
