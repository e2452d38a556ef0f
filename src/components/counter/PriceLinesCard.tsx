// The ticket's price lines: worked out from the garments, added from the list, adjusted with a
// reason, voided with a reason (kept, struck through), or "no charge" with a reason.
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Field, FormMessage } from '@/components/Field';
import { lineInput, voidLineInput } from '@/lib/shared/counter-request';
import { dateTimeText } from '@/lib/shared/date-text';
import { formatMoney } from '@/lib/pricing/money';
import { PRICE_KEYS, type PriceKey } from '@/lib/pricing/price-keys';
import type { CounterSummaryJson as CounterSummary } from '@/lib/shared/counter-views';
import { Money } from './Money';
import { MoneyField } from './MoneyField';
import { post, useCounterAction, usePriceList } from './counter-api';

type Line = z.infer<typeof lineInput>;
type Void = z.infer<typeof voidLineInput>;
type PriceLine = CounterSummary['lines'][number];
type Reason = { reason: string };
const button = 'min-h-11 rounded border-2 border-accent px-4 py-2 font-semibold text-accent disabled:opacity-50';

function AdjustForm({ s, canChange }: { s: CounterSummary; canChange: boolean }) {
  const { register, handleSubmit, formState, reset, control } = useForm<Line>({
    resolver: zodResolver(lineInput),
    defaultValues: { source: 'adjust', label: '', reason: '' },
  });
  const add = useCounterAction(s.ticket.id, (v: Line) => post(s.ticket.id, 'price-lines', v));
  const errors = formState.errors as Partial<Record<'label' | 'amountMinor' | 'reason', { message?: string; type: string }>>;
  return (
    <form
      noValidate
      aria-label="Adjust the price"
      onSubmit={handleSubmit((v) => add.mutate(v, { onSuccess: () => reset({ source: 'adjust', label: '', reason: '' }) }))}
      className="mt-3 grid gap-3 sm:grid-cols-3"
    >
      <input type="hidden" {...register('source')} />
      <Field label="Adjustment" registration={register('label')} error={errors.label as never} hint="e.g. Second pair, same cloth" id="adjust-label" />
      <MoneyField
        key={add.data ? String((add.data as { id?: string }).id) : 'new'}
        control={control}
        name="amountMinor"
        label={`Amount (${s.currency}, minus to take off)`}
        id="adjust-amount"
        currency={s.currency}
        hint="e.g. -5.00; taking off more than half the total needs the lead"
      />
      <Field label="Reason" registration={register('reason')} error={errors.reason as never} id="adjust-reason" hint="Kept on the ticket" />
      <div className="sm:col-span-3 flex flex-wrap items-center gap-3">
        <button type="submit" disabled={!canChange || add.isPending} className={button}>
          Add the adjustment
        </button>
        {add.error && <FormMessage kind="error">{add.error.message}</FormMessage>}
      </div>
    </form>
  );
}

function VoidForm({ s, line, onDone }: { s: CounterSummary; line: PriceLine; onDone: () => void }) {
  const { register, handleSubmit, formState } = useForm<Void>({ resolver: zodResolver(voidLineInput), defaultValues: { reason: '' } });
  const cancel = useCounterAction(s.ticket.id, (v: Void) => post(s.ticket.id, `price-lines/${line.id}/void`, v));
  return (
    <form
      noValidate
      aria-label={`Void ${line.label}`}
      onSubmit={handleSubmit((v) => cancel.mutate(v, { onSuccess: onDone }))}
      className="mt-2 flex flex-col gap-2"
    >
      <Field
        label={`Why is “${line.label}” wrong?`}
        id={`void-${line.id}`}
        registration={register('reason')}
        error={formState.errors.reason}
        autoFocus
        hint="Kept on the ticket and in its history"
      />
      <div className="flex flex-wrap gap-2">
        <button type="submit" disabled={cancel.isPending} className={button}>
          Void the line
        </button>
        <button type="button" onClick={onDone} className="min-h-11 rounded border-2 border-rule px-4 py-2 font-semibold">
          Keep it
        </button>
      </div>
      {cancel.error && <FormMessage kind="error">{cancel.error.message}</FormMessage>}
    </form>
  );
}

function LineRow({ s, line, canChange }: { s: CounterSummary; line: PriceLine; canChange: boolean }) {
  const [voiding, setVoiding] = useState(false);
  const voided = !!line.voidedAt;
  return (
    <tr className={`border-t border-rule align-top ${voided ? 'text-muted' : ''}`} data-testid={voided ? 'voided-line' : 'price-line'}>
      <td className="py-2 pr-3">
        <span className={voided ? 'line-through' : ''}>{line.label}</span>
        {line.reason && <div className="text-base text-muted">Reason: {line.reason}</div>}
        {voided && (
          <div className="text-base">
            <span className="font-semibold">Voided</span> {dateTimeText(line.voidedAt)}: {line.voidReason}
          </div>
        )}
        {canChange && !voided && !voiding && (
          <button
            type="button"
            onClick={() => setVoiding(true)}
            className="mt-1 min-h-11 rounded border-2 border-rule px-3 py-1 text-base font-semibold"
            aria-label={`Void ${line.label}`}
          >
            Void…
          </button>
        )}
        {voiding && <VoidForm s={s} line={line} onDone={() => setVoiding(false)} />}
      </td>
      <td className="py-2 text-right">
        {voided ? (
          <s aria-label={`voided, was ${formatMoney(line.amountMinor, s.currency)}`}>
            <Money minor={line.amountMinor} currency={s.currency} />
          </s>
        ) : (
          <Money minor={line.amountMinor} currency={s.currency} />
        )}
      </td>
    </tr>
  );
}

function NoChargeForm({ s }: { s: CounterSummary }) {
  const { register, handleSubmit, formState } = useForm<Reason>({ defaultValues: { reason: '' } });
  const mark = useCounterAction(s.ticket.id, (v: Reason) => post(s.ticket.id, 'price-lines', { source: 'no-charge', reason: v.reason }));
  return (
    <form noValidate aria-label="No charge" onSubmit={handleSubmit((v) => mark.mutate(v))} className="mt-3 flex flex-col gap-2 border-t border-rule pt-3">
      <Field
        label="No charge: why is this work free?"
        id="no-charge-reason"
        registration={register('reason', { validate: (v) => v.trim().length >= 3 || 'Say why this work is handed over with no charge.' })}
        error={formState.errors.reason}
        hint="Work with no price is handed over only with a reason."
      />
      <div>
        <button type="submit" disabled={mark.isPending} className={button}>
          Mark as no charge
        </button>
      </div>
      {mark.error && <FormMessage kind="error">{mark.error.message}</FormMessage>}
    </form>
  );
}

/** The lines with their total, and the counter's ways to change them. */
export function PriceLinesCard({ s, canChange }: { s: CounterSummary; canChange: boolean }) {
  const list = usePriceList();
  const [rush, setRush] = useState(false);
  // A worked-out line's key, or "kind:<id>" for one of the lead's kinds of work.
  const [key, setKey] = useState<string>('plain-hem');
  const auto = useCounterAction(s.ticket.id, () => post<{ unpriced: string[] }>(s.ticket.id, 'price-lines/auto', { rush }));
  const pick = useCounterAction(s.ticket.id, () =>
    post(
      s.ticket.id,
      'price-lines',
      key.startsWith('kind:') ? { source: 'kind', kindId: key.slice('kind:'.length) } : { source: 'list', key: key as PriceKey },
    ),
  );
  const error = auto.error ?? pick.error;
  return (
    <section aria-labelledby="lines-h" className="rounded border-2 border-rule bg-card p-4">
      <h2 id="lines-h" className="text-xl font-extrabold">
        Price
      </h2>
      {s.lines.length === 0 ? (
        <p className="mt-2 text-muted">No lines yet: price the ticket from its garments or add a line from the list.</p>
      ) : (
        <table className="mt-2 w-full text-lg">
          <caption className="sr-only">Price lines</caption>
          <tbody>
            {s.lines.map((l) => (
              <LineRow key={l.id} s={s} line={l} canChange={canChange} />
            ))}
          </tbody>
          <tfoot>
            <tr className="border-t-2 border-ink">
              <th scope="row" className="py-2 text-left">
                Total
              </th>
              <td className="py-2 text-right text-2xl font-extrabold">
                <Money minor={s.total} currency={s.currency} />
              </td>
            </tr>
          </tfoot>
        </table>
      )}
      {canChange && (
        <>
          <div className="mt-4 flex flex-wrap items-center gap-3">
            <label className="inline-flex min-h-11 items-center gap-2 font-semibold">
              <input type="checkbox" checked={rush} onChange={(e) => setRush(e.target.checked)} className="h-6 w-6" aria-describedby="rush-hint" />
              Rush
            </label>
            <button type="button" className={button} disabled={auto.isPending} onClick={() => auto.mutate(undefined)}>
              Price from the garments
            </button>
            <p id="rush-hint" className="w-full text-base text-muted">
              Rush is one surcharge per ticket with work on it, also work added by hand; unticked, pricing takes it off.
            </p>
          </div>
          <div className="mt-3 flex flex-wrap items-end gap-3">
            {/* Shrinks on a phone: the list's longest line is wider than the screen. */}
            <div className="flex min-w-0 max-w-full flex-col gap-1">
              <label htmlFor="list-line" className="font-semibold">
                Line from the price list
              </label>
              <select
                id="list-line"
                value={key}
                onChange={(e) => setKey(e.target.value)}
                className="min-h-11 w-full rounded border-2 border-rule bg-card px-3 py-2 text-lg"
              >
                {PRICE_KEYS.map((k) => {
                  const entry = list.data?.items.find((i) => i.key === k);
                  return (
                    <option key={k} value={k}>
                      {entry ? `${entry.label} — ${formatMoney(entry.amountMinor, list.data!.currency)}` : k}
                    </option>
                  );
                })}
                {list.data?.kinds
                  .filter((k) => !k.retiredAt)
                  .map((k) => (
                    <option key={k.id} value={`kind:${k.id}`}>
                      {`${k.name} — ${formatMoney(k.amountMinor, list.data!.currency)}`}
                    </option>
                  ))}
              </select>
            </div>
            <button type="button" className={button} disabled={pick.isPending} onClick={() => pick.mutate(undefined)}>
              Add the line
            </button>
          </div>
          {auto.data && auto.data.unpriced.length > 0 && (
            <FormMessage kind="error">{auto.data.unpriced.length} garment(s) have no finish yet and were not priced.</FormMessage>
          )}
          {error && <FormMessage kind="error">{error.message}</FormMessage>}
          <AdjustForm s={s} canChange={canChange} />
          {!s.lines.some((l) => !l.voidedAt) && <NoChargeForm s={s} />}
        </>
      )}
    </section>
  );
}
