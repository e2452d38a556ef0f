// The counter's panel for one ticket: price lines, total, deposit, balance, payments, notices,
// claim slip and handing over. Mounted on the ticket page and on /counter/[ticketId].
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { FormMessage } from '@/components/Field';
import { DueBadge } from '@/components/bench/DueBadge';
import { fetchJson } from '@/lib/shared/fetch-json';
import { isGarmentStep, stepLabel } from '@/lib/shared/garment-steps';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { withQuery } from '@/components/WithQuery';
import { can, type Role } from '@/lib/shared/roles';
import { NoticesCard } from './NoticesCard';
import { PaymentsCard } from './PaymentsCard';
import { PriceLinesCard } from './PriceLinesCard';
import { post, useCounterAction, useSummary } from './counter-api';

interface Props {
  ticketId: string;
  /** the shop's name: its initials start the ticket number */
  shopName: string;
  /** the viewer's role when the page knows it; otherwise read from /api/me */
  role?: Role;
  /** false where the page already shows the ticket's number, customer and step */
  withTicketHeader?: boolean;
}

/** The claim slip link with its copies: 1–3 slips and 0–3 tear-off tags per garment. */
function SlipPrint({ ticketId }: { ticketId: string }) {
  const [slips, setSlips] = useState(1);
  const [tags, setTags] = useState(1);
  const pick = (label: string, value: number, set: (n: number) => void, from: number) => (
    <label className="inline-flex min-h-11 items-center gap-2">
      {label}
      <select value={value} onChange={(e) => set(Number(e.target.value))} className="min-h-11 rounded border-2 border-rule bg-card px-2">
        {[0, 1, 2, 3]
          .filter((n) => n >= from)
          .map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
      </select>
    </label>
  );
  return (
    <>
      {pick('Slips', slips, setSlips, 1)}
      {pick('Tags per garment', tags, setTags, 0)}
      <a
        href={`/api/tickets/${ticketId}/claim-slip?slips=${slips}&tags=${tags}`}
        target="_blank"
        rel="noopener"
        className="inline-flex min-h-11 items-center rounded border-2 border-accent px-4 font-semibold text-accent"
      >
        Print the claim slip (PDF)
      </a>
    </>
  );
}

function Panel({ ticketId, shopName, role: given, withTicketHeader = true }: Props) {
  const summary = useSummary(ticketId);
  const me = useQuery({ queryKey: ['me'], queryFn: () => fetchJson<{ role: Role }>('/api/me'), enabled: !given });
  const role = given ?? me.data?.role;
  const handOver = useCounterAction(ticketId, () => post(ticketId, 'pickup'));
  if (summary.isPending || !role) return <p role="status">Loading the ticket's money…</p>;
  if (summary.error) return <FormMessage kind="error">{summary.error.message}</FormMessage>;
  const s = summary.data;
  const canPickup = can(role, ['tickets', 'pickup']);
  const collected = s.ticket.status === 'collected';
  const priced = s.lines.some((l) => !l.voidedAt);
  return (
    <div className="flex flex-col gap-4">
      <div className={withTicketHeader ? 'flex flex-wrap items-baseline gap-x-6 gap-y-2' : 'sr-only'}>
        <p className="text-4xl font-extrabold" data-testid="ticket-number">
          {ticketLabel(s.ticket.number, shopName)}
        </p>
        <p className="text-xl">{s.ticket.customerName ?? 'No customer named'}</p>
        <p className="text-xl">
          Status: <strong data-testid="ticket-status">{isGarmentStep(s.ticket.status) ? stepLabel(s.ticket.status) : s.ticket.status}</strong>
        </p>
        {s.ticket.dueOn && (
          <p className="text-xl">
            Due <DueBadge dueOn={s.ticket.dueOn} />
          </p>
        )}
      </div>
      <PriceLinesCard s={s} canChange={can(role, ['prices', 'adjust']) && !collected} />
      <PaymentsCard s={s} canTake={can(role, ['payments', 'take'])} canSend={can(role, ['notices', 'send'])} />
      <NoticesCard s={s} canSend={can(role, ['notices', 'send'])} />
      <section aria-labelledby="hand-h" className="rounded border-2 border-rule bg-card p-4">
        <h2 id="hand-h" className="text-xl font-extrabold">
          Claim slip and pickup
        </h2>
        <div className="mt-2 flex flex-wrap items-center gap-3">
          <SlipPrint ticketId={ticketId} />
          {canPickup && !collected && (
            <button
              type="button"
              onClick={() => handOver.mutate(undefined)}
              disabled={handOver.isPending || s.ticket.status !== 'ready' || s.due > 0 || !priced}
              className="min-h-11 rounded bg-ink px-5 py-2 text-lg font-semibold text-white disabled:opacity-50"
            >
              Hand over and close the ticket
            </button>
          )}
        </div>
        {!collected && s.ticket.status === 'ready' && s.due > 0 && <p className="mt-2 text-warn font-semibold">Take the balance before handing over.</p>}
        {!collected && !priced && (
          <p className="mt-2 text-warn font-semibold">No price yet: price the work, or mark it no charge with a reason, before handing over.</p>
        )}
        {s.credit > 0 && <p className="mt-2 font-semibold text-warn">{`Owed back to the customer: settle the credit under Payments.`}</p>}
        {collected && (
          <p className="mt-2 rounded border-2 border-ok bg-ok-soft px-3 py-2 text-lg font-semibold text-ok">
            Collected: the ticket is closed with its payment on record.
          </p>
        )}
        {handOver.error && <FormMessage kind="error">{handOver.error.message}</FormMessage>}
      </section>
    </div>
  );
}

/** The counter panel island for one ticket. */
export const TicketCounterPanel = withQuery(Panel);
export default TicketCounterPanel;
