import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fetchJson } from '@/lib/fetch-json';
import { nextStep, type GarmentStep } from '@/lib/garment-steps';
import { useStepLabel } from './use-bench';

interface Props {
  garmentId: string;
  status: GarmentStep;
  /** may move bench steps (advance) */
  canAdvance: boolean;
  /** may hand over (ready → collected) */
  canPickup: boolean;
  /** 'big' on the garment page, 'row' in the queue */
  size?: 'big' | 'row';
  /** a label naming the garment, for screen readers in a table of many */
  what?: string;
}

/** The one tap that moves a garment to its next step; says what went wrong in words. */
export function StepButton({ garmentId, status, canAdvance, canPickup, size = 'big', what }: Props) {
  const label = useStepLabel();
  const client = useQueryClient();
  const next = nextStep(status);
  const move = useMutation({
    mutationFn: (to: GarmentStep) => fetchJson<{ status: GarmentStep }>(`/api/garments/${garmentId}/step`, { method: 'POST', body: { to } }),
    onSuccess: () => client.invalidateQueries(),
  });
  if (!next) return null;
  const allowed = next === 'collected' ? canPickup : canAdvance;
  if (!allowed) return size === 'big' ? <p className="text-lg text-muted">Next: {label(next)} (not your step to mark).</p> : null;
  const look =
    size === 'big'
      ? 'min-h-16 w-full rounded-lg bg-accent px-6 text-2xl font-extrabold text-white sm:w-auto'
      : 'min-h-12 rounded-md bg-accent px-4 text-lg font-bold text-white whitespace-nowrap';
  return (
    <div className="flex flex-col gap-1">
      <button
        type="button"
        className={look + ' disabled:opacity-60'}
        disabled={move.isPending}
        onClick={() => move.mutate(next)}
        aria-label={what ? `Mark ${what} ${label(next)}` : undefined}
      >
        {move.isPending ? 'Moving…' : `Mark ${label(next)}`}
      </button>
      {move.error && (
        <p role="alert" className="text-base font-semibold text-cut">
          {move.error.message}
        </p>
      )}
    </div>
  );
}
