// Money at the counter: total, paid, due or the credit owed to the customer; every payment and
// refund with who, how and when; taking any amount up to what is due; settling a credit (cash
// back, card terminal, online refund through the payment service, or kept on the customer); and
// an online payment link.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormMessage } from '@/components/Field';
import { paymentInput, refundInput } from '@/lib/shared/counter-request';
import { dateTimeText } from '@/lib/shared/date-text';
import { formatMoney } from '@/lib/pricing/money';
import type { CounterSummaryJson as CounterSummary } from '@/lib/shared/counter-views';
import { Money } from './Money';
import { MoneyField } from './MoneyField';
import { post, useCounterAction } from './counter-api';

type Pay = z.infer<typeof paymentInput>;
type Refund = z.infer<typeof refundInput>;
const PAID_BY = { cash: 'cash', card: 'card at the counter', online: 'online', credit: 'kept credit' } as const;
const GIVEN_BACK = { cash: 'Cash back', card: 'Card refund at the counter', online: 'Online refund', credit: 'Kept as credit' } as const;
const REFUND_STATE = { pending: 'waiting for the payment service', done: 'done', failed: 'failed' } as const;

function Choice<T extends string>({
  name,
  options,
  register,
  legend,
}: {
  name: string;
  options: [T, string, boolean?][];
  register: (n: never) => object;
  legend: string;
}) {
  return (
    <fieldset className="flex flex-wrap gap-4">
      <legend className="mb-1 font-semibold">{legend}</legend>
      {options.map(([value, label, disabled]) => (
        <label key={value} className="inline-flex min-h-11 items-center gap-2 text-lg">
          <input type="radio" value={value} {...register(name as never)} disabled={disabled} className="h-6 w-6" />
          {label}
        </label>
      ))}
    </fieldset>
  );
}

function TakePayment({ s }: { s: CounterSummary }) {
  const { register, handleSubmit, control } = useForm<Pay>({ resolver: zodResolver(paymentInput), defaultValues: { method: 'cash', amountMinor: s.due } });
  const take = useCounterAction(s.ticket.id, (v: Pay) => post(s.ticket.id, 'payments', v));
  return (
    <form noValidate aria-label="Take a payment" onSubmit={handleSubmit((v) => take.mutate(v))} className="mt-4 flex flex-col gap-3 border-t border-rule pt-4">
      <h3 className="font-extrabold">Take a payment</h3>
      <Choice<Pay['method']>
        legend="Paid by"
        register={register as never}
        name="method"
        options={[
          ['cash', 'Cash'],
          ['card', 'Card (at the counter)'],
          ['credit', `Kept credit (${formatMoney(s.customerCredit, s.currency)})`, s.customerCredit <= 0],
        ]}
      />
      <MoneyField
        control={control}
        name="amountMinor"
        label={`Amount (${s.currency})`}
        id="pay-amount"
        currency={s.currency}
        hint={`Any amount up to the ${formatMoney(s.due, s.currency)} due; split it over several payments if the customer wants.`}
      />
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" disabled={take.isPending} className="min-h-11 rounded bg-accent px-5 py-2 text-lg font-semibold text-white disabled:opacity-60">
          Record the payment
        </button>
        {take.error && <FormMessage kind="error">{take.error.message}</FormMessage>}
      </div>
    </form>
  );
}

function SettleCredit({ s }: { s: CounterSummary }) {
  const online = s.payments.some((p) => p.method === 'online');
  const { register, handleSubmit, control } = useForm<Refund>({
    resolver: zodResolver(refundInput),
    defaultValues: { method: online ? 'online' : 'cash', amountMinor: s.credit, reason: '' },
  });
  const settle = useCounterAction(s.ticket.id, (v: Refund) => post(s.ticket.id, 'refunds', v));
  return (
    <form
      noValidate
      aria-label="Settle the credit"
      onSubmit={handleSubmit((v) => settle.mutate(v))}
      className="mt-4 flex flex-col gap-3 border-t border-rule pt-4"
    >
      <h3 className="font-extrabold">Settle the credit owed</h3>
      <Choice<Refund['method']>
        legend="Give it back as"
        register={register as never}
        name="method"
        options={[
          ['cash', 'Cash back'],
          ['card', 'Card refund at the counter'],
          ['online', 'Refund the online payment', !online],
          ['credit', 'Keep as credit for the customer', !s.ticket.customerId],
        ]}
      />
      <MoneyField
        control={control}
        name="amountMinor"
        label={`Amount (${s.currency})`}
        id="refund-amount"
        currency={s.currency}
        hint={`Up to the ${formatMoney(s.credit, s.currency)} owed.`}
      />
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" disabled={settle.isPending} className="min-h-11 rounded bg-accent px-5 py-2 text-lg font-semibold text-white disabled:opacity-60">
          Record how it was settled
        </button>
        {settle.error && <FormMessage kind="error">{settle.error.message}</FormMessage>}
      </div>
    </form>
  );
}

/** Copies the link to the clipboard; says so, or why it could not (an older browser, a page not served over https). */
function CopyLink({ url }: { url: string }) {
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setCopied('yes');
    } catch {
      setCopied('no');
    }
  };
  return (
    <>
      <button type="button" onClick={() => void copy()} className="min-h-11 rounded bg-accent px-4 py-2 font-semibold text-white">
        Copy link
      </button>
      {copied === 'yes' && <FormMessage kind="ok">Link copied: paste it where the customer will read it.</FormMessage>}
      {copied === 'no' && <FormMessage kind="error">This browser would not copy: open the pay page and copy its address instead.</FormMessage>}
    </>
  );
}

/** The open pay link as buttons (copy, send by e-mail, send by text), never as the service's raw
 * address with its session id; or the button that makes one. */
function PayLink({ s, canSend }: { s: CounterSummary; canSend: boolean }) {
  const make = useCounterAction(s.ticket.id, () => post(s.ticket.id, 'payments/link'));
  const send = useCounterAction(s.ticket.id, (channel: 'email' | 'sms') =>
    post<{ channel: string; to: string }>(s.ticket.id, 'notices', { kind: 'pay-link', channel }),
  );
  const open = s.link?.status === 'open' && s.link.amountMinor === s.due;
  const t = s.ticket;
  return (
    <div className="mt-4 border-t border-rule pt-4">
      <h3 className="font-extrabold">Pay ahead online</h3>
      {open ? (
        <>
          <p className="mt-1">
            A pay link for <Money minor={s.link!.amountMinor} currency={s.currency} className="font-semibold" /> is open.{' '}
            <a href={s.link!.url} target="_blank" rel="noopener" className="font-semibold text-accent underline" data-testid="pay-link">
              Open the pay page
            </a>
          </p>
          <div className="mt-2 flex flex-wrap items-center gap-2">
            <CopyLink url={s.link!.url} />
            {canSend && (
              <>
                <button
                  type="button"
                  onClick={() => send.mutate('email')}
                  disabled={send.isPending || !t.customerEmail}
                  className="min-h-11 rounded border-2 border-accent px-4 py-2 font-semibold text-accent disabled:opacity-50"
                >
                  Send by e-mail
                </button>
                <button
                  type="button"
                  onClick={() => send.mutate('sms')}
                  disabled={send.isPending || !t.customerPhone || !s.textsReady}
                  className="min-h-11 rounded border-2 border-accent px-4 py-2 font-semibold text-accent disabled:opacity-50"
                >
                  Send by text
                </button>
              </>
            )}
          </div>
          {canSend && !s.textsReady && <p className="text-base text-muted">Text messages are not set up for this shop: send the link by e-mail or copy it.</p>}
          {canSend && s.textsReady && !t.customerPhone && <p className="text-base text-muted">Not by text: no phone number for this customer.</p>}
          {canSend && !t.customerEmail && <p className="text-base text-muted">Not by e-mail: no e-mail address for this customer.</p>}
          {send.isSuccess && (
            <FormMessage kind="ok">
              Pay link sent by {send.data.channel === 'sms' ? 'text' : 'e-mail'} to {send.data.to}.
            </FormMessage>
          )}
          {send.error && <FormMessage kind="error">{send.error.message}</FormMessage>}
        </>
      ) : (
        <button
          type="button"
          onClick={() => make.mutate(undefined)}
          disabled={make.isPending}
          className="mt-2 min-h-11 rounded border-2 border-accent px-4 py-2 font-semibold text-accent disabled:opacity-50"
        >
          Make a payment link for the balance
        </button>
      )}
      <p className="text-base text-muted">The ready notice includes the link while it is open.</p>
      {make.error && <FormMessage kind="error">{make.error.message}</FormMessage>}
    </div>
  );
}

/** A payment's receipt: printed as a PDF, or e-mailed to the customer (refused, with the reason, without an address). */
function PaymentReceipt({ s, paymentId, canSend }: { s: CounterSummary; paymentId: string; canSend: boolean }) {
  const send = useCounterAction(s.ticket.id, () => post<{ to: string }>(s.ticket.id, `payments/${paymentId}/receipt`));
  return (
    <div className="mt-1 flex flex-wrap items-center gap-2">
      <a
        href={`/api/tickets/${s.ticket.id}/payments/${paymentId}/receipt`}
        target="_blank"
        rel="noopener"
        className="inline-flex min-h-11 items-center rounded border-2 border-accent px-3 text-base font-semibold text-accent"
      >
        Receipt
      </a>
      {canSend && (
        <button
          type="button"
          onClick={() => send.mutate(undefined)}
          disabled={send.isPending}
          className="min-h-11 rounded border-2 border-accent px-3 text-base font-semibold text-accent disabled:opacity-50"
        >
          E-mail receipt
        </button>
      )}
      {send.isSuccess && <FormMessage kind="ok">Receipt sent to {send.data.to}.</FormMessage>}
      {send.error && <FormMessage kind="error">{send.error.message}</FormMessage>}
    </div>
  );
}

/** Total, paid and due (or the credit owed) in large figures, the money on record, and the next step. */
export function PaymentsCard({ s, canTake, canSend = false }: { s: CounterSummary; canTake: boolean; canSend?: boolean }) {
  const settled = s.total > 0 && s.due === 0 && s.credit === 0;
  const open = s.ticket.status !== 'collected';
  return (
    <section aria-labelledby="pay-h" className="rounded border-2 border-rule bg-card p-4">
      <h2 id="pay-h" className="text-xl font-extrabold">
        Payments
      </h2>
      <dl className="mt-2 grid grid-cols-2 gap-3 text-center sm:grid-cols-4">
        <div>
          <dt className="text-muted">Total</dt>
          <dd className="text-2xl font-bold">
            <Money minor={s.total} currency={s.currency} />
          </dd>
        </div>
        <div>
          <dt className="text-muted">Paid{s.refunded > 0 ? ' (less given back)' : ''}</dt>
          <dd className="text-2xl font-bold">
            <Money minor={s.paid - s.refunded} currency={s.currency} />
          </dd>
        </div>
        <div>
          <dt className="text-muted">Balance due</dt>
          <dd className={`text-4xl font-extrabold ${s.due > 0 ? 'text-cut' : 'text-ok'}`} data-testid="balance-due">
            <Money minor={s.due} currency={s.currency} />
          </dd>
        </div>
        <div>
          <dt className="text-muted">Owed to the customer</dt>
          <dd className={`text-4xl font-extrabold ${s.credit > 0 ? 'text-warn' : ''}`} data-testid="credit-owed">
            <Money minor={s.credit} currency={s.currency} />
          </dd>
        </div>
      </dl>
      {s.credit > 0 && (
        <p className="mt-3 rounded border-2 border-warn px-3 py-2 font-semibold text-warn" role="status">
          The customer has paid {formatMoney(s.credit, s.currency)} more than the total: settle it below.
        </p>
      )}
      {(s.payments.length > 0 || s.refunds.length > 0) && (
        <ul className="mt-3 flex flex-col gap-1 text-lg" aria-label="Money on record">
          {s.payments.map((p) => (
            <li key={p.id} data-testid="payment-row">
              Paid by {PAID_BY[p.method]}: <Money minor={p.amountMinor} currency={s.currency} className="font-semibold" />{' '}
              <span className="text-muted">
                ({dateTimeText(p.at)}
                {p.takenByName ? `, taken by ${p.takenByName}` : p.method === 'online' ? ', through the payment link' : ''})
              </span>
              <PaymentReceipt s={s} paymentId={p.id} canSend={canTake} />
            </li>
          ))}
          {s.refunds.map((r) => (
            <li key={r.id} data-testid="refund-row">
              {GIVEN_BACK[r.method]}: <Money minor={r.amountMinor} currency={s.currency} className="font-semibold" />{' '}
              <span className={r.status === 'failed' ? 'font-semibold text-cut' : 'text-muted'}>
                ({REFUND_STATE[r.status]}, {dateTimeText(r.at)}
                {r.byName ? `, by ${r.byName}` : ''}
                {r.failure ? `: ${r.failure}` : ''})
              </span>
            </li>
          ))}
        </ul>
      )}
      {s.customerCredit > 0 && <p className="mt-2 text-base">Credit kept for this customer: {formatMoney(s.customerCredit, s.currency)}.</p>}
      {settled && <p className="mt-3 rounded border-2 border-ok bg-ok-soft px-3 py-2 font-semibold text-ok">Paid in full.</p>}
      {canTake && s.credit > 0 && <SettleCredit key={`${s.credit}-${s.refunds.length}`} s={s} />}
      {canTake && open && s.due > 0 && (
        <>
          <TakePayment key={`${s.due}-${s.payments.length}`} s={s} />
          <PayLink s={s} canSend={canSend} />
        </>
      )}
    </section>
  );
}
