// Notices to the customer: what was sent by e-mail or text, what failed and why (and what the SMS
// service reported back), retry, and the ready notice button.
import type { NoticeJson as Notice } from '@/lib/shared/counter-views';
import { FormMessage } from '@/components/Field';
import { dateTimeText } from '@/lib/shared/date-text';
import { PREFERENCE_LABEL, plannedSends, type ContactPreference } from '@/lib/shared/contact-channels';
import type { CounterSummaryJson as CounterSummary } from '@/lib/shared/counter-views';
import { post, useCounterAction, useNotices } from './counter-api';

const STATE: Record<Notice['status'], { text: string; look: string }> = {
  queued: { text: 'Sending…', look: 'border-rule' },
  sent: { text: 'Sent', look: 'border-ok bg-ok-soft text-ok' },
  failed: { text: 'Not delivered', look: 'border-cut bg-cut-soft text-cut' },
};

const WHAT: Record<Notice['kind'], string> = { ready: 'Ready notice', 'pay-link': 'Pay link' };
const BY: Record<Notice['channel'], string> = { email: 'e-mail', sms: 'text' };
const REPORT: Record<NonNullable<Notice['delivery']>, string> = {
  delivered: 'delivered to the phone',
  undelivered: 'not delivered to the phone',
  failed: 'the phone could not be reached',
};

function NoticeRow({ n, canSend }: { n: Notice; canSend: boolean }) {
  const retry = useCounterAction(n.ticketId, () => post(n.ticketId, `notices/${n.id}/retry`));
  return (
    <li className={`rounded border-2 p-3 ${STATE[n.status].look}`} data-testid="notice-row" data-channel={n.channel}>
      <div className="font-semibold [overflow-wrap:anywhere]">
        {WHAT[n.kind]}
        {n.sequence > 1 ? ` (sent again, ${n.sequence})` : ''} by {BY[n.channel]} to {n.to}: {STATE[n.status].text}
        {n.status === 'sent' && ` ${dateTimeText(n.sentAt)}`}
      </div>
      {n.delivery && (
        <div className={n.delivery === 'delivered' ? 'text-base' : 'text-base font-semibold text-cut'} data-testid="notice-delivery">
          The SMS service reports: {REPORT[n.delivery]}
          {n.deliveryError ? ` (${n.deliveryError})` : ''}, {dateTimeText(n.deliveryAt)}
        </div>
      )}
      {n.note && (
        <div className="text-base text-warn" data-testid="notice-note">
          {n.note}
        </div>
      )}
      <div className="text-base">
        {n.attempts} attempt{n.attempts === 1 ? '' : 's'}
        {n.createdById === null && ' · sent by the shop setting'}
      </div>
      {n.status === 'failed' && (
        <>
          <p className="text-base">Last error: {n.lastError}</p>
          <p className="text-base">{n.nextAttemptAt ? `Next automatic try: ${dateTimeText(n.nextAttemptAt)}` : 'No more automatic tries: retry by hand.'}</p>
          {canSend && (
            <button
              type="button"
              onClick={() => retry.mutate(undefined)}
              disabled={retry.isPending}
              className="mt-2 min-h-11 rounded border-2 border-ink bg-card px-4 py-2 font-semibold text-ink"
            >
              Retry now
            </button>
          )}
          {retry.error && <FormMessage kind="error">{retry.error.message}</FormMessage>}
        </>
      )}
    </li>
  );
}

/** What the counter should know before sending: how the notice will actually go, or why it cannot. */
function reachLine(contactBy: ContactPreference, email: string | null, phone: string | null, textsReady: boolean): string | null {
  const { sends, refused } = plannedSends({ email, phone, contactBy }, textsReady);
  if (refused) return refused;
  return sends.find((x) => x.note)?.note ?? null;
}

/** The ticket's notices and the button that sends the ready notice. */
export function NoticesCard({ s, canSend }: { s: CounterSummary; canSend: boolean }) {
  const notices = useNotices(s.ticket.id);
  const send = useCounterAction(s.ticket.id, () => post(s.ticket.id, 'notices', { kind: 'ready' }));
  const again = useCounterAction(s.ticket.id, () => post(s.ticket.id, 'notices', { kind: 'ready', again: true }));
  const ready = notices.data?.filter((n) => n.kind === 'ready') ?? [];
  const hasReady = ready.length > 0;
  // Sent again only after the last one went on every channel (a failed one is retried instead).
  const lastSequence = Math.max(0, ...ready.map((n) => n.sequence));
  const lastSent = hasReady && ready.filter((n) => n.sequence === lastSequence).every((n) => n.status === 'sent');
  const t = s.ticket;
  const reach = reachLine(t.contactBy, t.customerEmail, t.customerPhone, s.textsReady === true);
  return (
    <section aria-labelledby="notices-h" className="rounded border-2 border-rule bg-card p-4">
      <h2 id="notices-h" className="text-xl font-extrabold">
        Notices to the customer
      </h2>
      <p className="mt-1 text-base" data-testid="contact-preference">
        The customer wants notices by {PREFERENCE_LABEL[t.contactBy].toLowerCase()}.{reach && <span className="text-warn"> {reach}</span>}
      </p>
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
        </div>
      )}
      {canSend && lastSent && s.ticket.status === 'ready' && (
        <div className="mt-3">
          <button
            type="button"
            onClick={() => again.mutate(undefined)}
            disabled={again.isPending}
            className="min-h-11 rounded border-2 border-accent px-4 py-2 font-semibold text-accent disabled:opacity-50"
          >
            Send the ready notice again
          </button>
        </div>
      )}
      {send.error && <FormMessage kind="error">{send.error.message}</FormMessage>}
      {again.error && <FormMessage kind="error">{again.error.message}</FormMessage>}
    </section>
  );
}
