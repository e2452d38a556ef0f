import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useForm, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { FormMessage, SubmitButton } from '@/components/Field';
import { withQuery } from '@/components/WithQuery';
import { fetchJson } from '@/lib/shared/fetch-json';
import { timeZoneRequest } from '@/lib/shared/time-zone-request';

type Form = z.input<typeof timeZoneRequest>;
type Saved = { timeZone: string; chosen: boolean };
const resolver = zodResolver(timeZoneRequest) as unknown as Resolver<Form, unknown, z.output<typeof timeZoneRequest>>;

/** Every zone the browser knows, with the saved one kept even if it is missing from the list. */
function zoneNames(saved: string): string[] {
  const known = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return known.includes(saved) ? known : [saved, ...known];
}

function ZoneForm({ initial }: { initial: Saved }) {
  const client = useQueryClient();
  const device = Intl.DateTimeFormat().resolvedOptions().timeZone;
  const { register, handleSubmit, formState, setValue } = useForm<Form, unknown, z.output<typeof timeZoneRequest>>({
    resolver,
    defaultValues: { timeZone: initial.timeZone },
  });
  const save = useMutation({
    mutationFn: (body: Form) => fetchJson<Saved>('/api/shop-time-zone', { method: 'PUT', body }),
    onSuccess: (saved) => client.setQueryData(['shop-time-zone'], saved),
  });
  return (
    <form
      noValidate
      aria-label="Shop time zone"
      onSubmit={handleSubmit((v) => save.mutate(v))}
      className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4"
    >
      <h2 className="text-xl font-extrabold">The shop’s time zone</h2>
      <p className="text-muted">
        Where the shop’s days begin and end: the overview counts each day’s work and takings by it.
        {initial.chosen ? '' : ' Not chosen yet: the overview uses Europe/London.'}
      </p>
      <label htmlFor="time-zone" className="font-semibold">
        Time zone
      </label>
      <select
        id="time-zone"
        {...register('timeZone')}
        className="max-w-full rounded border-2 border-ink bg-card px-2 text-lg"
        aria-invalid={formState.errors.timeZone ? true : undefined}
      >
        {zoneNames(initial.timeZone).map((z) => (
          <option key={z} value={z}>
            {z}
          </option>
        ))}
      </select>
      {formState.errors.timeZone && <FormMessage kind="error">{formState.errors.timeZone.message}</FormMessage>}
      {device && device !== initial.timeZone && (
        <div>
          <button type="button" onClick={() => setValue('timeZone', device)} className="min-h-11 rounded border-2 border-ink px-3 font-semibold">
            Use this device’s zone ({device})
          </button>
        </div>
      )}
      {save.error && <FormMessage kind="error">Not saved: {save.error.message}</FormMessage>}
      {save.isSuccess && <FormMessage kind="ok">Saved.</FormMessage>}
      <div>
        <SubmitButton busy={save.isPending}>Save time zone</SubmitButton>
      </div>
    </form>
  );
}

function Loader() {
  const zone = useQuery({ queryKey: ['shop-time-zone'], queryFn: () => fetchJson<Saved>('/api/shop-time-zone') });
  if (zone.isError)
    return (
      <p role="alert" className="font-semibold text-cut">
        {zone.error.message}
      </p>
    );
  if (zone.isPending) return <p className="text-muted">Loading…</p>;
  return <ZoneForm initial={zone.data} />;
}

/** The lead's choice of the shop's time zone (on the bench settings page). */
export default withQuery(Loader);
