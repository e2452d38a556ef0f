import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import { useFieldArray, useForm, useWatch, type Resolver } from 'react-hook-form';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { withQuery } from '@/components/WithQuery';
import { intakeRequest, type Intake, type IntakeInput } from '@/lib/shared/bench-requests';
import type { CustomerHit } from '@/lib/shared/customer-types';
import { CustomerSearch } from '@/components/customers/CustomerSearch';
import { ContactByField } from '@/components/customers/ContactByField';
import { SameAsLastTime, usePreviousFittings } from '@/components/customers/SameAsLastTime';
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';
import { DEFAULT_EXISTING_FINISH } from '@/lib/shared/existing-finish';
import { GARMENT_KIND_LABELS, OFFERED_KINDS, type OfferedKind } from '@/lib/shared/fitting/garment-kinds';
import { ExistingFinishSelect } from './ExistingFinishSelect';
import { useAssignees } from './use-bench';
import { usePriceList } from '@/components/counter/counter-api';
import { GarmentPricing, IntakeTotal } from './IntakePricing';

type Form = IntakeInput & { garments: NonNullable<IntakeInput['garments']> };
const resolver = zodResolver(intakeRequest) as unknown as Resolver<Form, unknown, Intake>;
const SELECT = 'min-h-12 rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent';
// A pair comes in with a plain hem unless the counter says otherwise (DEFAULT_EXISTING_FINISH).
const NEW_GARMENT = {
  description: '',
  kind: 'trousers' as OfferedKind,
  dueOn: '',
  assigneeId: '',
  existingFinish: DEFAULT_EXISTING_FINISH,
  fittingFrom: '',
  finish: '' as '' | 'hem' | 'cuff',
  work: [] as string[],
};

/** Pricing at intake is the counter's and the lead's (prices/adjust): others take work in unpriced. */
function IntakeScreen({ canPrice = false }: { canPrice?: boolean }) {
  const people = useAssignees();
  const prices = usePriceList();
  const list = canPrice ? prices.data : undefined;
  const [who, setWho] = useState<'existing' | 'new'>('existing');
  const [known, setKnown] = useState<CustomerHit | null>(null);
  const { register, control, handleSubmit, formState, setError, setValue } = useForm<Form, unknown, Intake>({
    resolver,
    defaultValues: { customerId: '', note: '', dueOn: '', garments: [{ ...NEW_GARMENT }], rush: false },
  });
  const garments = useFieldArray({ control, name: 'garments' });
  const typed = useWatch({ control, name: 'garments' });
  const rush = useWatch({ control, name: 'rush' }) ?? false;
  const fittingFrom = typed.map((g) => g?.fittingFrom);
  const previous = usePreviousFittings(who === 'existing' ? (known?.id ?? null) : null);
  const offers = who === 'existing' && known ? (previous.data ?? []) : [];
  const chooseKnown = (c: CustomerHit | null) => {
    setKnown(c);
    setValue('customerId', c?.id ?? '', { shouldValidate: formState.isSubmitted });
    // Another customer's fittings are not this one's.
    garments.fields.forEach((_, i) => setValue(`garments.${i}.fittingFrom`, ''));
  };
  const open = useMutation({
    mutationFn: (body: Intake) => fetchJson<{ id: string }>('/api/tickets', { body }),
    onSuccess: (t) => window.location.assign(`/tickets/${t.id}`),
    onError: (e) => {
      if (e instanceof ApiError) for (const [path, message] of Object.entries(e.issues)) setError(path as 'note', { type: 'server', message });
    },
  });
  const submit = handleSubmit((v) => {
    if (who === 'existing' && !v.customerId) return setError('customerId', { message: 'Choose a customer, or add a new one.' });
    open.mutate(
      who === 'existing' ? { ...v, customer: undefined } : { ...v, customerId: null, garments: v.garments.map((g) => ({ ...g, fittingFrom: null })) },
    );
  });
  const e = formState.errors;
  return (
    <form noValidate onSubmit={submit} aria-label="New ticket" className="flex flex-col gap-6">
      <fieldset className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4">
        <legend className="px-1 text-xl font-extrabold">Customer</legend>
        <div className="flex flex-wrap gap-4 text-lg">
          <label className="inline-flex min-h-11 items-center gap-2">
            <input type="radio" name="who" checked={who === 'existing'} onChange={() => setWho('existing')} className="size-5" /> Someone we know
          </label>
          <label className="inline-flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name="who"
              checked={who === 'new'}
              onChange={() => {
                setWho('new');
                chooseKnown(null);
              }}
              className="size-5"
            />{' '}
            A new customer
          </label>
        </div>
        {who === 'existing' ? (
          <CustomerSearch
            id="customerId"
            label="Find the customer"
            chosen={known}
            onChoose={chooseKnown}
            error={e.customerId?.message}
            hint="Type a name, a phone number (any part), an e-mail or a ticket number."
          />
        ) : (
          <div className="grid gap-3 sm:grid-cols-2">
            <Field label="Name" registration={register('customer.name')} error={e.customer?.name} id="c-name" autoComplete="off" />
            <Field label="Phone" type="tel" registration={register('customer.phone')} error={e.customer?.phone} id="c-phone" autoComplete="off" />
            <Field label="E-mail" type="email" registration={register('customer.email')} error={e.customer?.email} id="c-email" autoComplete="off" />
            <Field label="Notes" registration={register('customer.notes')} error={e.customer?.notes} id="c-notes" autoComplete="off" />
            <ContactByField id="c-contact-by" registration={register('customer.contactBy')} error={e.customer?.contactBy} />
          </div>
        )}
      </fieldset>

      <fieldset className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4">
        <legend className="px-1 text-xl font-extrabold">Garments</legend>
        {garments.fields.map((f, i) => (
          <div key={f.id} className="grid items-end gap-3 border-b border-rule pb-3 sm:grid-cols-2 lg:grid-cols-[minmax(0,2fr)_repeat(4,minmax(0,1fr))_auto]">
            <Field
              label={`Garment ${i + 1}`}
              registration={register(`garments.${i}.description`)}
              error={e.garments?.[i]?.description}
              id={`g-${i}-description`}
              placeholder="e.g. Navy wool trousers, cuffs"
            />
            <div className="flex flex-col gap-1">
              <label htmlFor={`g-${i}-kind`} className="font-semibold">
                Kind
              </label>
              <select
                id={`g-${i}-kind`}
                {...register(`garments.${i}.kind`, {
                  // A finish is a trouser leg's: another kind is priced by its own line.
                  onChange: (ev) => ev.target.value !== 'trousers' && setValue(`garments.${i}.finish`, ''),
                })}
                className={SELECT}
              >
                {OFFERED_KINDS.map((k) => (
                  <option key={k} value={k}>
                    {GARMENT_KIND_LABELS[k]}
                  </option>
                ))}
              </select>
              {e.garments?.[i]?.kind && <FormMessage kind="error">{e.garments[i].kind.message}</FormMessage>}
            </div>
            <ExistingFinishSelect
              id={`g-${i}-existing`}
              registration={register(`garments.${i}.existingFinish`)}
              error={e.garments?.[i]?.existingFinish}
              hint={false}
            />
            <Field label="Due" type="date" registration={register(`garments.${i}.dueOn`)} error={e.garments?.[i]?.dueOn} id={`g-${i}-due`} />
            <div className="flex flex-col gap-1">
              <label htmlFor={`g-${i}-who`} className="font-semibold">
                Given to
              </label>
              <select id={`g-${i}-who`} {...register(`garments.${i}.assigneeId`)} className={SELECT}>
                <option value="">Nobody yet</option>
                {people.data
                  ?.filter((p) => p.role !== 'counter')
                  .map((p) => (
                    <option key={p.userId} value={p.userId}>
                      {p.name}
                    </option>
                  ))}
              </select>
            </div>
            {garments.fields.length > 1 && (
              <button
                type="button"
                aria-label={`Remove: garment ${i + 1}`}
                onClick={() => garments.remove(i)}
                className="min-h-12 justify-self-start rounded border-2 border-ink px-3 font-semibold"
              >
                Remove
              </button>
            )}
            {canPrice && (
              <GarmentPricing
                index={i}
                kind={typed[i]?.kind ?? 'trousers'}
                list={list}
                finish={typed[i]?.finish ?? ''}
                work={(typed[i]?.work ?? []).filter((w): w is string => !!w)}
                onFinish={(f) => setValue(`garments.${i}.finish`, f as 'hem' | 'cuff' | 'original' | '')}
                onWork={(ids) => setValue(`garments.${i}.work`, ids)}
              />
            )}
            {offers.length > 0 && (
              <div className="sm:col-span-2 lg:col-span-6">
                <SameAsLastTime
                  garmentLabel={`garment ${i + 1}`}
                  fittings={offers}
                  chosen={fittingFrom[i]}
                  onChoose={(id) => setValue(`garments.${i}.fittingFrom`, id ?? '')}
                />
              </div>
            )}
          </div>
        ))}
        <p className="text-sm text-muted">
          Existing finish: what the bottoms are now. An old cuff is let down and pressed out before the new finish is made, and the price list's line for that
          is added by itself.
        </p>
        <button
          type="button"
          onClick={() => garments.append({ ...NEW_GARMENT })}
          className="min-h-11 self-start rounded border-2 border-accent px-4 text-lg font-semibold text-accent"
        >
          Another garment
        </button>
      </fieldset>

      <fieldset className="grid gap-3 rounded-lg border-2 border-rule bg-card p-4 sm:grid-cols-[2fr_1fr]">
        <legend className="px-1 text-xl font-extrabold">Ticket</legend>
        <Field label="Note for the bench" registration={register('note')} error={e.note} id="t-note" autoComplete="off" />
        <Field label="Due (all garments, unless set above)" type="date" registration={register('dueOn')} error={e.dueOn} id="t-due" />
        {canPrice && <IntakeTotal list={list} garments={typed} rush={rush} onRush={(r) => setValue('rush', r)} />}
      </fieldset>

      {open.error && <FormMessage kind="error">Not opened: {open.error.message} Everything you typed is still here.</FormMessage>}
      <div>
        <SubmitButton busy={open.isPending}>Open ticket</SubmitButton>
      </div>
    </form>
  );
}

/** The intake island: customer, garments brought in, a note and a due date; opens the ticket. */
export default withQuery(IntakeScreen);
