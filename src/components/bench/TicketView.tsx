import { zodResolver } from '@hookform/resolvers/zod';
import { PREFERENCE_LABEL } from '@/lib/shared/contact-channels';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import { SameAsLastTime, usePreviousFittings } from '@/components/customers/SameAsLastTime';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { withQuery } from '@/components/WithQuery';
import { garmentInput } from '@/lib/shared/bench-requests';
import type { TicketDetail } from '@/lib/shared/bench-types';
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';
import { nextStep, type GarmentStep } from '@/lib/shared/garment-steps';
import { ticketLabel } from '@/lib/shared/ticket-number';
import type { z } from 'zod';
import { CustomerEdit } from './CustomerEdit';
import { DueBadge } from './DueBadge';
import { NoFittingAsk } from './NoFittingAsk';
import { StepButton } from './StepButton';
import { useFittingGate } from './use-fitting-gate';
import { useStepLabel } from './use-bench';
import { GARMENT_KIND_LABELS, OFFERED_KINDS } from '@/lib/shared/fitting/garment-kinds';

interface Props {
  ticketId: string;
  /** the shop's name: its initials start the ticket number */
  shopName: string;
  canAdvance: boolean;
  canPickup: boolean;
  canAddGarment: boolean;
  canEditCustomer: boolean;
}

type GarmentForm = z.input<typeof garmentInput>;
const resolver = zodResolver(garmentInput) as unknown as Resolver<GarmentForm, unknown, z.output<typeof garmentInput>>;

function AddGarment({ ticketId, customerId }: { ticketId: string; customerId: string | null }) {
  const client = useQueryClient();
  const { register, handleSubmit, reset, setError, setValue, control, formState } = useForm<GarmentForm, unknown, z.output<typeof garmentInput>>({
    resolver,
    defaultValues: { description: '', kind: 'trousers', dueOn: '', fittingFrom: '' },
  });
  const fittingFrom = useWatch({ control, name: 'fittingFrom' });
  const previous = usePreviousFittings(customerId);
  const add = useMutation({
    mutationFn: (body: z.output<typeof garmentInput>) => fetchJson(`/api/tickets/${ticketId}/garments`, { body }),
    onSuccess: () => {
      reset();
      void client.invalidateQueries({ queryKey: ['ticket', ticketId] });
    },
    onError: (e) => {
      // The server's word on a field goes beside that field, the first one focused.
      if (!(e instanceof ApiError)) return;
      let first = true;
      for (const [path, message] of Object.entries(e.issues)) {
        if (path !== 'description' && path !== 'dueOn') continue;
        setError(path, { type: 'server', message }, { shouldFocus: first });
        first = false;
      }
    },
  });
  return (
    <form
      noValidate
      onSubmit={handleSubmit((v) => add.mutate(v))}
      aria-label="Add a garment"
      className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4"
    >
      <h2 className="text-xl font-extrabold">Add a garment</h2>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr]">
        <Field
          label="Garment"
          registration={register('description')}
          error={formState.errors.description}
          id="add-description"
          placeholder="e.g. Brown tweed trousers"
        />
        <Field label="Due" type="date" registration={register('dueOn')} error={formState.errors.dueOn} id="add-due" />
        <div className="flex flex-col gap-1">
          <label htmlFor="add-kind" className="font-semibold">
            Kind
          </label>
          <select
            id="add-kind"
            {...register('kind')}
            className="min-h-12 w-full min-w-0 rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent"
          >
            {OFFERED_KINDS.map((k) => (
              <option key={k} value={k}>
                {GARMENT_KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </div>
      </div>
      {add.error && <FormMessage kind="error">{add.error.message}</FormMessage>}
      <SameAsLastTime garmentLabel="the new garment" fittings={previous.data ?? []} chosen={fittingFrom} onChoose={(id) => setValue('fittingFrom', id ?? '')} />
      <div>
        <SubmitButton busy={add.isPending}>Add garment</SubmitButton>
      </div>
    </form>
  );
}

function MoveAll({ ticket, canAdvance, canPickup }: { ticket: TicketDetail; canAdvance: boolean; canPickup: boolean }) {
  const client = useQueryClient();
  const label = useStepLabel();
  const next = nextStep(ticket.status);
  const move = useMutation({
    mutationFn: (status: GarmentStep) => fetchJson(`/api/tickets/${ticket.id}`, { method: 'PATCH', body: { status } }),
    onSuccess: () => client.invalidateQueries(),
  });
  const behind = ticket.garments.filter((g) => g.status === ticket.status).length;
  const unfitted = (t: TicketDetail) => t.garments.filter((g) => g.status === t.status && !g.fitted).length;
  const gate = useFittingGate(unfitted(ticket) === 1 ? 'one of these garments' : `${unfitted(ticket)} of these garments`);
  if (!next || ticket.garments.length < 2 || !(next === 'collected' ? canPickup : canAdvance)) return null;
  // Read fresh at the tap: a fitting may have been saved on another screen since the page was drawn.
  const allFitted = () =>
    client.fetchQuery({ queryKey: ['ticket', ticket.id], queryFn: () => fetchJson<TicketDetail>(`/api/tickets/${ticket.id}`), staleTime: 0 }).then(
      (t) => unfitted(t) === 0,
      () => true,
    );
  return (
    <div className="flex flex-col gap-1">
      <button
        type="button"
        onClick={() => void gate.check(ticket.status, next, allFitted, () => move.mutate(next))}
        disabled={move.isPending}
        className="min-h-14 self-start rounded-lg border-2 border-accent px-5 text-xl font-bold text-accent disabled:opacity-60"
      >
        Mark {behind === 1 ? 'the garment' : `all ${behind}`} at {label(ticket.status)} as {label(next)}
      </button>
      {gate.refused && (
        <p role="alert" className="font-semibold text-cut">
          {gate.refused}
        </p>
      )}
      <NoFittingAsk {...gate.ask} />
      {move.error && (
        <p role="alert" className="font-semibold text-cut">
          {move.error.message}
        </p>
      )}
    </div>
  );
}

function Ticket({ ticketId, shopName, canAdvance, canPickup, canAddGarment, canEditCustomer }: Props) {
  const ticket = useQuery({ queryKey: ['ticket', ticketId], queryFn: () => fetchJson<TicketDetail>(`/api/tickets/${ticketId}`) });
  const label = useStepLabel();
  const [editing, setEditing] = useState(false);
  if (ticket.isError)
    return (
      <p role="alert" className="text-xl font-semibold text-cut">
        {ticket.error.message}
      </p>
    );
  if (ticket.isPending) return <p className="text-xl text-muted">Loading the ticket…</p>;
  const t = ticket.data;
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-2">
        <h1 className="text-4xl font-extrabold">
          Ticket <span data-testid="ticket-page-number">{ticketLabel(t.number, shopName)}</span>
        </h1>
        <p className="text-2xl">
          Stands at <strong>{label(t.status)}</strong>
          <span className="text-lg text-muted"> (the least advanced garment)</span>
        </p>
        {t.customer ? (
          <p className="text-lg">
            <strong>{t.customer.name}</strong>
            {t.customer.phone && <> · {t.customer.phone}</>}
            {t.customer.email && <> · {t.customer.email}</>}
            {t.customer.contactBy && <span className="text-muted"> · notices by {PREFERENCE_LABEL[t.customer.contactBy].toLowerCase()}</span>}
          </p>
        ) : (
          <p className="text-lg text-muted">No customer recorded.</p>
        )}
        {t.customer?.notes && <p className="text-lg">Customer notes: {t.customer.notes}</p>}
        {t.customer &&
          canEditCustomer &&
          (editing ? (
            <CustomerEdit customer={t.customer} onDone={() => setEditing(false)} />
          ) : (
            <button type="button" onClick={() => setEditing(true)} className="min-h-11 self-start rounded-md border-2 border-ink px-4 text-lg font-semibold">
              Change the customer’s details
            </button>
          ))}
        {t.note && <p className="text-lg">Note: {t.note}</p>}
      </header>
      <MoveAll ticket={t} canAdvance={canAdvance} canPickup={canPickup} />
      <section aria-labelledby="garments-heading" className="flex flex-col gap-3">
        <h2 id="garments-heading" className="text-2xl font-extrabold">
          Garments
        </h2>
        {t.garments.length === 0 && <p className="text-lg text-muted">No garments on this ticket yet.</p>}
        <ul className="flex flex-col gap-3">
          {t.garments.map((g) => (
            <li key={g.id} className="flex flex-wrap items-center justify-between gap-4 rounded-lg border-2 border-rule bg-card p-4">
              <div className="flex flex-col gap-1">
                <a href={`/garments/${g.id}`} className="flex min-h-11 items-center text-2xl font-extrabold text-accent underline">
                  {g.description}
                </a>
                <p className="text-lg">
                  {g.kind && g.kind !== 'trousers' && <span data-testid="garment-kind">{GARMENT_KIND_LABELS[g.kind]} · </span>}
                  <strong>{label(g.status)}</strong> · <DueBadge dueOn={g.dueOn} /> · {g.assigneeName ?? 'Unassigned'}
                </p>
              </div>
              <StepButton garmentId={g.id} status={g.status} canAdvance={canAdvance} canPickup={canPickup} size="row" what={g.description} fitted={g.fitted} />
            </li>
          ))}
        </ul>
      </section>
      {canAddGarment && t.status !== 'collected' && <AddGarment ticketId={t.id} customerId={t.customer?.id ?? null} />}
    </div>
  );
}

/** The ticket page island: number, customer, its garments and their steps. */
export default withQuery(Ticket);
