// Notices to the customer: what was sent, what failed and why, retry, and the ready notice button.
import type { NoticeJson as Notice } from '@/lib/counter-views';
import { FormMessage } from '@/components/Field';
import { dateTimeText } from '@/lib/date-text';
import type { CounterSummaryJson as CounterSummary } from '@/lib/counter-views';
import { post, useCounterAction, useNotices } from './counter-api';

const STATE: Record<Notice['status'], { text: string; look: string }> = {
  queued: { text: 'Sending…', look: 'border-rule' },
  sent: { text: 'Sent', look: 'border-ok bg-ok-soft text-ok' },
  failed: { text: 'Not delivered', look: 'border-cut bg-cut-soft text-cut' },
};

function NoticeRow({ n, canSend }: { n: Notice; canSend: boolean }) {
  const retry = useCounterAction(n.ticketId, () => post(n.ticketId, `notices/${n.id}/retry`));
  return (
    <li className={`rounded border-2 p-3 ${STATE[n.status].look}`}>
      <div className="font-semibold">
        Ready notice{n.sequence > 1 ? ` (sent again, ${n.sequence})` : ''} to {n.to}: {STATE[n.status].text}
        {n.status === 'sent' && ` ${dateTimeText(n.sentAt)}`}
      </div>
      <div className="text-base">
        {n.attempts} attempt{n.attempts === 1 ? '' : 's'}
        {n.createdById === null && ' · sent by the shop setting'}
      </div>
      {n.status === 'failed' && (
        <>
          <p className="text-base">Last error: {n.lastError}</p>
          <p className="text-base">{n.nextAttemptAt ? `Next automatic try: ${dateTimeText(n.nextAttemptAt)}` : 'No more automatic tries: retry by hand.'}</p>
          {canSend && (
            <button type="button" onClick={() => retry.mutate(undefined)} disabled={retry.isPending} className="mt-2 min-h-11 rounded border-2 border-ink bg-card px-4 py-2 font-semibold text-ink">
              Retry now
            </button>
          )}
          {retry.error && <FormMessage kind="error">{retry.error.message}</FormMessage>}
        </>
      )}
    </li>
  );
}

/** The ticket's notices and the button that sends the ready notice. */
export function NoticesCard({ s, canSend }: { s: CounterSummary; canSend: boolean }) {
  const notices = useNotices(s.ticket.id);
  const send = useCounterAction(s.ticket.id, () => post(s.ticket.id, 'notices', { kind: 'ready' }));
  const again = useCounterAction(s.ticket.id, () => post(s.ticket.id, 'notices', { kind: 'ready', again: true }));
  const ready = notices.data?.filter((n) => n.kind === 'ready') ?? [];
  const hasReady = ready.length > 0;
  // Sent again only after the last one went (a failed one is retried instead).
  const lastSent = hasReady && ready.reduce((a, b) => (b.sequence > a.sequence ? b : a)).status === 'sent';
  return (
    <section aria-labelledby="notices-h" className="rounded border-2 border-rule bg-card p-4">
      <h2 id="notices-h" className="text-xl font-extrabold">
        Notices to the customer
      </h2>
      {notices.data && notices.data.length === 0 && <p className="mt-2 text-muted">Nothing sent yet.</p>}
      <ul className="mt-2 flex flex-col gap-2">
        {notices.data?.map((n) => (
          <NoticeRow key={n.id} n={n} canSend={canSend} />
        ))}
      </ul>
      {canSend && !hasReady && (
        <div className="mt-3">
          <button
            type="button"
            onClick={() => send.mutate(undefined)}
            disabled={send.isPending || s.ticket.status !== 'ready'}
            className="min-h-11 rounded bg-accent px-5 py-2 text-lg font-semibold text-white disabled:opacity-50"
          >
            Send the ready notice
          </button>
          {s.ticket.status !== 'ready' && <p className="text-base text-muted">Possible once every garment is ready.</p>}
          {!s.ticket.customerEmail && <p className="text-base text-warn">No e-mail address for this customer: call them instead.</p>}
        </div>
      )}
      {canSend && lastSent && s.ticket.status === 'ready' && (
        <div className="mt-3">
          <button type="button" onClick={() => again.mutate(undefined)} disabled={again.isPending} className="min-h-11 rounded border-2 border-accent px-4 py-2 font-semibold text-accent disabled:opacity-50">
            Send the ready notice again
          </button>
        </div>
      )}
      {send.error && <FormMessage kind="error">{send.error.message}</FormMessage>}
      {again.error && <FormMessage kind="error">{again.error.message}</FormMessage>}
    </section>
  );
}
