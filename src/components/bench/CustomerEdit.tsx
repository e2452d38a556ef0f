import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useForm, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { ContactByField } from '@/components/customers/ContactByField';
import { customerPatch } from '@/lib/shared/customer-request';
import type { CustomerCard } from '@/lib/shared/bench-types';
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';

type Form = z.input<typeof customerPatch>;
type Patch = z.output<typeof customerPatch>;
const resolver = zodResolver(customerPatch) as unknown as Resolver<Form, unknown, Patch>;

/** Change a customer's name, phone, e-mail, notes or how notices reach them. */
export function CustomerEdit({ customer, onDone }: { customer: CustomerCard; onDone: () => void }) {
  const client = useQueryClient();
  const { register, handleSubmit, formState, setError } = useForm<Form, unknown, Patch>({
    resolver,
    defaultValues: {
      name: customer.name,
      phone: customer.phone ?? '',
      email: customer.email ?? '',
      notes: customer.notes ?? '',
      contactBy: customer.contactBy ?? 'email',
    },
  });
  const save = useMutation({
    mutationFn: (body: Patch) => fetchJson(`/api/customers/${customer.id}`, { method: 'PATCH', body }),
    onSuccess: async () => {
      await client.invalidateQueries();
      onDone();
    },
    onError: (e) => {
      if (e instanceof ApiError) for (const [k, message] of Object.entries(e.issues)) setError(k as 'name', { type: 'server', message });
    },
  });
  const e = formState.errors;
  return (
    <form
      noValidate
      aria-label="Edit the customer"
      onSubmit={handleSubmit((v) => save.mutate(v))}
      className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4"
    >
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Name" registration={register('name')} error={e.name} id="cust-name" autoComplete="off" />
        <Field label="Phone" type="tel" registration={register('phone')} error={e.phone} id="cust-phone" autoComplete="off" />
        <Field label="E-mail" type="email" registration={register('email')} error={e.email} id="cust-email" autoComplete="off" />
        <Field label="Notes" registration={register('notes')} error={e.notes} id="cust-notes" autoComplete="off" />
        <ContactByField id="cust-contact-by" registration={register('contactBy')} error={e.contactBy} />
      </div>
      {save.error && <FormMessage kind="error">Not saved: {save.error.message}</FormMessage>}
      <div className="flex flex-wrap gap-3">
        <SubmitButton busy={save.isPending}>Save customer</SubmitButton>
        <button type="button" onClick={onDone} className="min-h-11 rounded border-2 border-ink px-4 text-lg font-semibold">
          Cancel
        </button>
      </div>
    </form>
  );
}
