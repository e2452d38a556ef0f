// The lead's kinds of work beside the six worked-out lines: each a flat price, rush or not;
// renamed, re-priced, retired (never deleted: tickets keep the lines they have) or brought back.
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Field, FormMessage } from '@/components/Field';
import { priceKindInput } from '@/lib/shared/counter-request';
import type { AsJson } from '@/lib/shared/as-json';
import type { PriceKindView, PriceListView } from '@/lib/shared/counter-views';
import { fetchJson } from '@/lib/shared/fetch-json';
import type { Currency } from '@/lib/pricing/money';
import { MoneyField } from './MoneyField';

type Kind = AsJson<PriceKindView>;
type KindForm = z.infer<typeof priceKindInput>;
const button = 'min-h-11 rounded border-2 border-accent px-4 py-2 font-semibold text-accent disabled:opacity-50';
const quiet = 'min-h-11 rounded border-2 border-rule px-4 py-2 font-semibold disabled:opacity-50';

/** A mutation on the list that refreshes it and its history. */
function useListChange<I, O = unknown>(call: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: call,
    onSettled: () => {
      void client.invalidateQueries({ queryKey: ['prices'] });
      void client.invalidateQueries({ queryKey: ['price-history'] });
    },
  });
}

function KindRow({ kind, currency }: { kind: Kind; currency: Currency }) {
  const { register, handleSubmit, formState, control } = useForm<KindForm>({
    resolver: zodResolver(priceKindInput),
    defaultValues: { name: kind.name, amountMinor: kind.amountMinor, rushApplies: kind.rushApplies },
  });
  const change = useListChange((body: Partial<KindForm> & { retired?: boolean }) => fetchJson(`/api/prices/kinds/${kind.id}`, { method: 'PATCH', body }));
  const retired = kind.retiredAt !== null;
  return (
    <li className={`border-t border-rule pt-3 ${retired ? 'text-muted' : ''}`} data-testid="price-kind">
      <form
        noValidate
        aria-label={`Kind of work: ${kind.name}`}
        onSubmit={handleSubmit((v) => change.mutate(v))}
        className="grid items-end gap-3 sm:grid-cols-[2fr_1fr_auto]"
      >
        <Field label="Name" id={`kind-${kind.id}-name`} registration={register('name')} error={formState.errors.name} />
        <MoneyField control={control} name="amountMinor" label={`Price (${currency})`} id={`kind-${kind.id}-amount`} currency={currency} />
        <label className="inline-flex min-h-11 items-center gap-2 font-semibold">
          <input type="checkbox" {...register('rushApplies')} className="h-6 w-6" />
          Rush applies
        </label>
        <div className="flex flex-wrap items-center gap-3 sm:col-span-3">
          <button type="submit" className={button} disabled={change.isPending}>
            Save {kind.name}
          </button>
          <button type="button" className={quiet} disabled={change.isPending} onClick={() => change.mutate({ retired: !retired })}>
            {retired ? `Bring back ${kind.name}` : `Retire ${kind.name}`}
          </button>
          {retired && <span className="font-semibold">Retired: off the counter’s list; tickets keep their lines.</span>}
          {change.error && <FormMessage kind="error">{change.error.message}</FormMessage>}
        </div>
      </form>
    </li>
  );
}

function AddKind({ currency }: { currency: Currency }) {
  const blank = { name: '', rushApplies: true } as KindForm;
  const { register, handleSubmit, formState, control, reset } = useForm<KindForm>({ resolver: zodResolver(priceKindInput), defaultValues: blank });
  const add = useListChange((body: KindForm) => fetchJson<Kind>('/api/prices/kinds', { body }));
  return (
    <form
      noValidate
      aria-label="Add a kind of work"
      onSubmit={handleSubmit((v) => add.mutate(v, { onSuccess: () => reset(blank) }))}
      className="mt-4 grid items-end gap-3 border-t-2 border-ink pt-3 sm:grid-cols-[2fr_1fr_auto]"
    >
      <Field
        label="New kind of work"
        id="new-kind-name"
        registration={register('name')}
        error={formState.errors.name}
        hint='e.g. "Replace zip", "Taper legs"'
      />
      {/* A fresh field after each addition: the typed amount goes with the kind it priced. */}
      <MoneyField key={add.data?.id ?? 'new'} control={control} name="amountMinor" label={`Its price (${currency})`} id="new-kind-amount" currency={currency} />
      <label className="inline-flex min-h-11 items-center gap-2 font-semibold">
        <input type="checkbox" {...register('rushApplies')} className="h-6 w-6" />
        Rush applies
      </label>
      <div className="flex flex-wrap items-center gap-3 sm:col-span-3">
        <button type="submit" className={button} disabled={add.isPending}>
          Add to the price list
        </button>
        {add.error && <FormMessage kind="error">{add.error.message}</FormMessage>}
        {add.isSuccess && <FormMessage kind="ok">Added: {add.data.name}.</FormMessage>}
      </div>
    </form>
  );
}

/** The kinds of work section of the lead's price list page. */
export function PriceKindsCard({ list }: { list: AsJson<PriceListView> }) {
  return (
    <section aria-labelledby="kinds-h" className="rounded border-2 border-rule bg-card p-4">
      <h2 id="kinds-h" className="text-xl font-extrabold">
        Kinds of work
      </h2>
      <p className="text-muted">
        Flat-priced work beside the lines above, picked per garment at intake or at the counter. Rush applies: a rush ticket with this work pays the rush
        surcharge (once per ticket).
      </p>
      {list.kinds.length === 0 ? (
        <p className="mt-2">None yet.</p>
      ) : (
        <ul className="mt-3 flex flex-col gap-3">
          {list.kinds.map((k) => (
            // Keyed by the saved values too: a saved change shows as saved, not as still typed.
            <KindRow key={`${k.id}-${k.name}-${k.amountMinor}-${k.rushApplies}-${k.retiredAt ?? ''}`} kind={k} currency={list.currency} />
          ))}
        </ul>
      )}
      <AddKind currency={list.currency} />
    </section>
  );
}
