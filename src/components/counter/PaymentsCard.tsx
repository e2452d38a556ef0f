// Deposit, balance and payments: take cash or card at the counter, or make an online payment link.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { FormMessage } from '@/components/Field';
import { paymentInput } from '@/lib/counter-request';
import { dateTimeText } from '@/lib/date-text';
import { formatMoney } from '@/lib/pricing/money';
import type { CounterSummary } from '@/services/counter/payments';
import { Money } from './Money';
import { MoneyField } from './MoneyField';
import { post, useCounterAction } from './counter-api';

type Pay = z.infer<typeof paymentInput>;
const PURPOSE = { deposit: 'Deposit', balance: 'Balance' } as const;
const METHOD = { cash: 'cash', card: 'card', online: 'online' } as const;

function TakePayment({ s }: { s: CounterSummary }) {
  const hasDeposit = s.payments.some((p) => p.purpose === 'deposit');
  const purpose = hasDeposit || s.paid > 0 ? 'balance' : 'deposit';
  const { register, handleSubmit, control, watch } = useForm<Pay>({
    resolver: zodResolver(paymentInput),
    defaultValues: { purpose, method: 'cash', amountMinor: purpose === 'balance' ? s.due : Number.NaN },
  });
  const take = useCounterAction(s.ticket.id, (v: Pay) => post(s.ticket.id, 'payments', v));
  const chosen = watch('purpose');
  return (
    <form noValidate aria-label="Take a payment" onSubmit={handleSubmit((v) => take.mutate(v))} className="mt-4 flex flex-col gap-3 border-t border-rule pt-4">
      <fieldset className="flex flex-wrap gap-4">
        <legend className="mb-1 font-semibold">For</legend>
        {(['deposit', 'balance'] as const).map((p) => (
          <label key={p} className="inline-flex min-h-11 items-center gap-2 text-lg">
            <input type="radio" value={p} {...register('purpose')} disabled={p === 'deposit' && hasDeposit} className="h-6 w-6" />
            {PURPOSE[p]}
          </label>
        ))}
      </fieldset>
      <fieldset className="flex flex-wrap gap-4">
        <legend className="mb-1 font-semibold">Paid by</legend>
        {(['cash', 'card'] as const).map((m) => (
          <label key={m} className="inline-flex min-h-11 items-center gap-2 text-lg">
            <input type="radio" value={m} {...register('method')} className="h-6 w-6" />
            {m === 'cash' ? 'Cash' : 'Card (at the counter)'}
          </label>
        ))}
      </fieldset>
      <MoneyField
        control={control}
        name="amountMinor"
        label={`Amount (${s.currency})`}
        id="pay-amount"
        currency={s.currency}
        hint={chosen === 'balance' ? `The balance due is ${formatMoney(s.due, s.currency)}.` : 'Up to the ticket total.'}
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

function PayLink({ s }: { s: CounterSummary }) {
  const make = useCounterAction(s.ticket.id, () => post(s.ticket.id, 'payments/link'));
  const open = s.link?.status === 'open' && s.link.amountMinor === s.due;
  return (
    <div className="mt-4 border-t border-rule pt-4">
      <h3 className="font-extrabold">Pay ahead online</h3>
      {open ? (
        <p className="mt-1 break-all">
          Link for <Money minor={s.link!.amountMinor} currency={s.currency} />:{' '}
          <a href={s.link!.url} className="font-semibold text-accent" data-testid="pay-link">
            {s.link!.url}
          </a>
        </p>
      ) : (
        <button type="button" onClick={() => make.mutate(undefined)} disabled={make.isPending} className="mt-2 min-h-11 rounded border-2 border-accent px-4 py-2 font-semibold text-accent disabled:opacity-50">
          Make a payment link for the balance
        </button>
      )}
      <p className="text-base text-muted">The ready notice includes the link while it is open.</p>
      {make.error && <FormMessage kind="error">{make.error.message}</FormMessage>}
    </div>
  );
}

/** Total, paid and due in large figures, the payments on record, and taking the next one. */
export function PaymentsCard({ s, canTake }: { s: CounterSummary; canTake: boolean }) {
  const settled = s.payments.some((p) => p.purpose === 'balance') || (s.total > 0 && s.due === 0);
  return (
    <section aria-labelledby="pay-h" className="rounded border-2 border-rule bg-card p-4">
      <h2 id="pay-h" className="text-xl font-extrabold">
        Payments
      </h2>
      <dl className="mt-2 grid grid-cols-3 gap-3 text-center">
        <div>
          <dt className="text-muted">Total</dt>
          <dd className="text-2xl font-bold">
            <Money minor={s.total} currency={s.currency} />
          </dd>
        </div>
        <div>
          <dt className="text-muted">Paid</dt>
          <dd className="text-2xl font-bold">
            <Money minor={s.paid} currency={s.currency} />
          </dd>
        </div>
        <div>
          <dt className="text-muted">Balance due</dt>
          <dd className={`text-4xl font-extrabold ${s.due > 0 ? 'text-cut' : 'text-ok'}`} data-testid="balance-due">
            <Money minor={s.due} currency={s.currency} />
          </dd>
        </div>
      </dl>
      {s.payments.length > 0 && (
        <ul className="mt-3 flex flex-col gap-1 text-lg" aria-label="Payments on record">
          {s.payments.map((p) => (
            <li key={p.id}>
              {PURPOSE[p.purpose]}, {METHOD[p.method]}: <Money minor={p.amountMinor} currency={s.currency} className="font-semibold" />{' '}
              <span className="text-muted">({dateTimeText(p.at)})</span>
            </li>
          ))}
        </ul>
      )}
      {settled && <p className="mt-3 rounded border-2 border-ok bg-ok-soft px-3 py-2 font-semibold text-ok">Paid in full.</p>}
      {canTake && !settled && s.ticket.status !== 'collected' && s.total > 0 && (
        <>
          <TakePayment key={s.payments.length} s={s} />
          <PayLink s={s} />
        </>
      )}
    </section>
  );
}
