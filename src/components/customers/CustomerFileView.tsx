import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { FormMessage } from '@/components/Field';
import { CustomerEdit } from '@/components/bench/CustomerEdit';
import { useStepLabel } from '@/components/bench/use-bench';
import type { CustomerFile } from '@/lib/shared/customer-types';
import { dateTimeText } from '@/lib/shared/date-text';
import { PREFERENCE_LABEL } from '@/lib/shared/contact-channels';
import { fetchJson } from '@/lib/shared/fetch-json';
import { formatMoney, isCurrency } from '@/lib/pricing/money';

const FIELD_NAMES: Record<string, string> = { name: 'name', phone: 'phone', email: 'e-mail', notes: 'notes', contactBy: 'notices by' };

/** One line of the details' history in words: who changed which fields, with old → new while kept. */
function historyText(action: string, detail: Record<string, unknown>): string {
  if (action === 'customer.created') return 'Added';
  if (action === 'customer.erased') return 'Erased on the customer’s request (money records kept)';
  if (action !== 'customer.changed') return action;
  if (detail.erased) return `Changed ${(detail.fields as string[]).map((f) => FIELD_NAMES[f] ?? f).join(', ')} (old values erased)`;
  return Object.entries(detail as Record<string, { old: unknown; new: unknown }>)
    .map(([k, v]) => `${FIELD_NAMES[k] ?? k}: ${v.old ?? '—'} → ${v.new ?? '—'}`)
    .join('; ');
}

function EraseCustomer({ id, name }: { id: string; name: string }) {
  const client = useQueryClient();
  const [asking, setAsking] = useState(false);
  const erase = useMutation({
    mutationFn: () => fetchJson(`/api/customers/${id}/erase`, { method: 'POST', body: {} }),
    onSuccess: () => client.invalidateQueries(),
  });
  return (
    <section aria-labelledby="erase-title" className="flex flex-col gap-2 rounded-lg border-2 border-cut bg-card p-4">
      <h3 id="erase-title" className="text-lg font-extrabold">
        Forget this customer
      </h3>
      <p>
        On the customer’s request: their name becomes “erased”, phone, e-mail and notes are cleared and the photos of their garments deleted. Tickets, price
        lines and payments stay, as the money records must. This cannot be undone.
      </p>
      {erase.error && <FormMessage kind="error">Not erased: {erase.error.message}</FormMessage>}
      {asking ? (
        <div className="flex flex-wrap gap-3">
          <button
            type="button"
            onClick={() => erase.mutate()}
            disabled={erase.isPending}
            className="min-h-11 rounded border-2 border-cut bg-cut px-4 text-lg font-semibold text-card"
          >
            Yes, erase {name}
          </button>
          <button type="button" onClick={() => setAsking(false)} className="min-h-11 rounded border-2 border-ink px-4 text-lg font-semibold">
            Keep
          </button>
        </div>
      ) : (
        <button type="button" onClick={() => setAsking(true)} className="min-h-11 self-start rounded border-2 border-cut px-4 text-lg font-semibold text-cut">
          Erase personal details…
        </button>
      )}
    </section>
  );
}

/** A customer's file on the customers screen: details (editable), tickets with garments, payments
 * and notices, the history of changes, and erasure for the lead. */
export function CustomerFileView({ id, canEdit, canErase }: { id: string; canEdit: boolean; canErase: boolean }) {
  const file = useQuery({ queryKey: ['customer-file', id], queryFn: () => fetchJson<CustomerFile>(`/api/customers/${id}/file`) });
  const stepName = useStepLabel();
  const [editing, setEditing] = useState(false);
  if (file.isPending) return <p role="status">Loading the customer…</p>;
  if (file.isError) return <FormMessage kind="error">{file.error.message}</FormMessage>;
  const { customer: c, tickets, history } = file.data;
  const erased = Boolean(c.erasedAt);
  return (
    <article aria-labelledby="customer-title" className="flex flex-col gap-4">
      <section className="flex flex-col gap-2 rounded-lg border-2 border-rule bg-card p-4">
        <h2 id="customer-title" className="text-2xl font-extrabold [overflow-wrap:anywhere]">
          {c.name}
        </h2>
        {erased ? (
          <p className="text-muted">Personal details erased {dateTimeText(c.erasedAt)}.</p>
        ) : (
          <dl className="grid gap-x-4 gap-y-1 text-lg sm:grid-cols-[auto_1fr]">
            <dt className="font-semibold">Phone</dt>
            <dd className="[overflow-wrap:anywhere]">{c.phone || '—'}</dd>
            <dt className="font-semibold">E-mail</dt>
            <dd className="[overflow-wrap:anywhere]">{c.email || '—'}</dd>
            <dt className="font-semibold">Notes</dt>
            <dd className="[overflow-wrap:anywhere]">{c.notes || '—'}</dd>
            <dt className="font-semibold">Notices by</dt>
            <dd data-testid="contact-by">{PREFERENCE_LABEL[c.contactBy]}</dd>
          </dl>
        )}
        {canEdit &&
          !erased &&
          (editing ? (
            <CustomerEdit customer={c} onDone={() => setEditing(false)} />
          ) : (
            <button
              type="button"
              onClick={() => setEditing(true)}
              className="min-h-11 self-start rounded border-2 border-accent px-4 text-lg font-semibold text-accent"
            >
              Edit details
            </button>
          ))}
      </section>

      <section aria-labelledby="tickets-title" className="flex flex-col gap-3">
        <h3 id="tickets-title" className="text-xl font-extrabold">
          Tickets
        </h3>
        {tickets.length === 0 && <p className="text-muted">No tickets yet.</p>}
        {tickets.map((t) => {
          const paid = t.payments.reduce((sum, p) => sum + p.amountMinor, 0);
          const currency = t.payments[0]?.currency;
          return (
            <div key={t.id} className="flex flex-col gap-1 rounded-lg border-2 border-rule bg-card p-3">
              <p className="flex flex-wrap items-center gap-x-3 text-lg">
                <a href={`/tickets/${t.id}`} className="inline-flex min-h-11 items-center font-bold text-accent">
                  {t.label}
                </a>
                <span>{stepName(t.status)}</span>
                <span className="text-muted">taken in {dateTimeText(t.createdAt)}</span>
                <a href={`/counter/${t.id}`} className="inline-flex min-h-11 items-center font-semibold text-accent">
                  Counter
                </a>
              </p>
              <ul className="list-disc pl-6">
                {t.garments.map((g) => (
                  <li key={g.id}>
                    <a href={`/garments/${g.id}`} className="text-accent underline">
                      {g.description}
                    </a>{' '}
                    · {stepName(g.status)}
                  </li>
                ))}
              </ul>
              <p>
                Paid:{' '}
                {t.payments.length === 0 ? (
                  'nothing yet'
                ) : (
                  <>
                    <span className="tabular-nums">{isCurrency(currency) ? formatMoney(paid, currency) : (paid / 100).toFixed(2)}</span> (
                    {t.payments.map((p) => `${p.method}, ${dateTimeText(p.at)}`).join('; ')})
                  </>
                )}
              </p>
              {t.refunds.length > 0 && (
                <p>
                  Given back:{' '}
                  {t.refunds
                    .map(
                      (r) =>
                        `${isCurrency(r.currency) ? formatMoney(r.amountMinor, r.currency) : (r.amountMinor / 100).toFixed(2)} ${r.method === 'credit' ? 'kept as credit' : r.method} (${r.status}), ${dateTimeText(r.at)}`,
                    )
                    .join('; ')}
                </p>
              )}
              {t.notices.length > 0 && (
                <p>Notices: {t.notices.map((n) => `${n.kind} ${n.status}${n.sentAt ? ` ${dateTimeText(n.sentAt)}` : ''}`).join('; ')}</p>
              )}
            </div>
          );
        })}
      </section>

      <section aria-labelledby="history-title" className="flex flex-col gap-2">
        <h3 id="history-title" className="text-xl font-extrabold">
          History of the details
        </h3>
        <ol className="flex flex-col gap-1">
          {history.map((h) => (
            <li key={h.id} className="[overflow-wrap:anywhere]">
              <span className="text-muted">
                {dateTimeText(h.at)} · {h.actorName ?? 'someone'}:
              </span>{' '}
              {historyText(h.action, h.detail)}
            </li>
          ))}
        </ol>
      </section>

      {canErase && !erased && <EraseCustomer id={c.id} name={c.name} />}
    </article>
  );
}
