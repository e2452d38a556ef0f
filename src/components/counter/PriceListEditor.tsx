// The lead's price list: an amount for each piece of work, the currency, opening hours, and
// whether the ready notice goes out by itself.
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { withQuery } from '@/components/WithQuery';
import { priceListInput } from '@/lib/shared/counter-request';
import { fetchJson } from '@/lib/shared/fetch-json';
import { CURRENCIES, type Currency } from '@/lib/pricing/money';
import type { PriceListView } from '@/lib/shared/counter-views';
import type { AsJson } from '@/lib/shared/as-json';
import { MoneyField } from './MoneyField';
import { PriceHistoryCard } from './PriceHistoryCard';
import { PriceKindsCard } from './PriceKindsCard';

type List = z.infer<typeof priceListInput>;

function Editor({ list }: { list: AsJson<PriceListView> }) {
  const client = useQueryClient();
  const { register, handleSubmit, formState, watch, control } = useForm<List>({
    resolver: zodResolver(priceListInput),
    defaultValues: { currency: list.currency, hours: list.hours, location: list.location, autoReadyNotice: list.autoReadyNotice, items: list.items },
  });
  const save = useMutation({
    mutationFn: (v: List) => fetchJson<AsJson<PriceListView>>('/api/prices', { method: 'PUT', body: v }),
    onSuccess: (data) => {
      client.setQueryData(['prices'], data);
      void client.invalidateQueries({ queryKey: ['price-history'] });
    },
  });
  const currency = watch('currency') as Currency;
  return (
    <form noValidate onSubmit={handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-5">
      <section aria-labelledby="list-h" className="rounded border-2 border-rule bg-card p-4">
        <h2 id="list-h" className="text-xl font-extrabold">
          Prices
        </h2>
        <p className="text-muted">Amounts in {currency}. A taper let-out is added by itself when the plan needs one; rush is added once per ticket.</p>
        <div className="mt-3 flex flex-col gap-4">
          {list.items.map((item, i) => (
            <div key={item.key} className="grid gap-3 sm:grid-cols-[2fr_1fr]">
              <input type="hidden" {...register(`items.${i}.key`)} />
              <Field
                label={`Line ${i + 1}: name`}
                id={`item-${item.key}-label`}
                registration={register(`items.${i}.label`)}
                error={formState.errors.items?.[i]?.label}
              />
              <MoneyField
                control={control}
                name={`items.${i}.amountMinor`}
                label={`Line ${i + 1}: price (${currency})`}
                id={`item-${item.key}-amount`}
                currency={currency}
              />
            </div>
          ))}
        </div>
      </section>
      <section aria-labelledby="shop-h" className="grid gap-4 rounded border-2 border-rule bg-card p-4 sm:grid-cols-2">
        <h2 id="shop-h" className="text-xl font-extrabold sm:col-span-2">
          Counter settings
        </h2>
        <div className="flex flex-col gap-1">
          <label htmlFor="currency" className="font-semibold">
            Currency
          </label>
          <select id="currency" {...register('currency')} className="min-h-11 rounded border-2 border-rule bg-card px-3 py-2 text-lg">
            {Object.keys(CURRENCIES).map((c) => (
              <option key={c}>{c}</option>
            ))}
          </select>
        </div>
        <Field label="Where the shop is (on the claim slip)" id="location" registration={register('location')} error={formState.errors.location} />
        <Field
          label="Opening hours (in the ready notice)"
          id="hours"
          registration={register('hours')}
          error={formState.errors.hours}
          hint="e.g. Tue–Fri 9:00–17:30, Sat 9:00–13:00"
        />
        <label className="inline-flex min-h-11 items-center gap-3 text-lg font-semibold sm:col-span-2">
          <input type="checkbox" {...register('autoReadyNotice')} className="h-6 w-6" />
          Send the ready notice by itself when every garment of a ticket is ready
        </label>
      </section>
      {save.error && <FormMessage kind="error">{save.error.message}</FormMessage>}
      {save.isSuccess && <FormMessage kind="ok">Price list saved.</FormMessage>}
      <div>
        <SubmitButton busy={save.isPending}>Save the price list</SubmitButton>
      </div>
    </form>
  );
}

function PriceList() {
  const list = useQuery({ queryKey: ['prices'], queryFn: () => fetchJson<AsJson<PriceListView>>('/api/prices') });
  if (list.isPending) return <p role="status">Loading the price list…</p>;
  if (list.error) return <FormMessage kind="error">{list.error.message}</FormMessage>;
  // The six lines and the settings are one form; the kinds are saved one by one, each with its history.
  return (
    <div className="flex flex-col gap-5">
      <Editor list={list.data} />
      <PriceKindsCard list={list.data} />
      <PriceHistoryCard currency={list.data.currency} />
    </div>
  );
}

/** The price list island. */
export const PriceListEditor = withQuery(PriceList);
export default PriceListEditor;
