import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useForm, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { garmentPatch } from '@/lib/shared/bench-requests';
import type { GarmentDetail } from '@/lib/shared/bench-types';
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';
import { ExistingFinishSelect } from './ExistingFinishSelect';
import { useAssignees } from './use-bench';

type Form = z.input<typeof garmentPatch>;
type Patch = z.output<typeof garmentPatch>;
const resolver = zodResolver(garmentPatch) as unknown as Resolver<Form, unknown, Patch>;

/** Change a garment's description, due date, who works on it or its existing finish (each change lands in the history). */
export function GarmentEdit({ garment, onDone }: { garment: GarmentDetail; onDone: () => void }) {
  const client = useQueryClient();
  const people = useAssignees();
  const { register, handleSubmit, formState, setError } = useForm<Form, unknown, Patch>({
    resolver,
    defaultValues: {
      description: garment.description,
      dueOn: garment.dueOn ?? '',
      assigneeId: garment.assigneeId ?? '',
      existingFinish: garment.existingFinish,
    },
  });
  const save = useMutation({
    mutationFn: (body: Patch) => fetchJson(`/api/garments/${garment.id}`, { method: 'PATCH', body }),
    onSuccess: async () => {
      await client.invalidateQueries();
      onDone();
    },
    onError: (e) => {
      if (e instanceof ApiError) for (const [k, message] of Object.entries(e.issues)) setError(k as 'description', { type: 'server', message });
    },
  });
  return (
    <form
      noValidate
      aria-label="Edit the garment"
      onSubmit={handleSubmit((v) => save.mutate(v))}
      className="flex flex-col gap-3 rounded-lg border-2 border-rule bg-card p-4"
    >
      <div className="grid items-start gap-3 sm:grid-cols-[2fr_1fr_1fr]">
        <Field label="Garment" registration={register('description')} error={formState.errors.description} id="edit-description" />
        <Field label="Due" type="date" registration={register('dueOn')} error={formState.errors.dueOn} id="edit-due" />
        <div className="flex flex-col gap-1">
          <label htmlFor="edit-who" className="font-semibold">
            Given to
          </label>
          <select id="edit-who" {...register('assigneeId')} className="min-h-11 rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent">
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
        <ExistingFinishSelect id="edit-existing" registration={register('existingFinish')} error={formState.errors.existingFinish} />
      </div>
      {save.error && <FormMessage kind="error">Not saved: {save.error.message}</FormMessage>}
      <div className="flex flex-wrap gap-3">
        <SubmitButton busy={save.isPending}>Save</SubmitButton>
        <button type="button" onClick={onDone} className="min-h-11 rounded border-2 border-ink px-4 text-lg font-semibold">
          Cancel
        </button>
      </div>
    </form>
  );
}
