import { useState } from 'react';
import { useSay } from '@/components/I18n';
import { previousStep, type GarmentStep } from '@/lib/shared/garment-steps';
import { useStepLabel } from './use-bench';
import { useStepBack } from './use-step-back';

interface Props {
  garmentId: string;
  status: GarmentStep;
  /** may move bench steps, so may step one back */
  canAdvance: boolean;
  /** may step a collected garment back to ready (the lead) */
  canReopen: boolean;
}

/** The garment page's way back one step, for a step marked by mistake; kept in the history like any move. */
export function StepBackButton({ garmentId, status, canAdvance, canReopen }: Props) {
  const label = useStepLabel();
  const say = useSay();
  const back = useStepBack(garmentId);
  const [said, setSaid] = useState('');
  const prev = previousStep(status);
  const allowed = prev !== null && (status === 'collected' ? canReopen : canAdvance);
  return (
    <div className="flex flex-col gap-1">
      {allowed && (
        <button
          type="button"
          onClick={() => back.mutate(status, { onSuccess: () => setSaid(say('move.steppedBack', `Stepped back to ${label(prev)}.`, { step: label(prev) })) })}
          disabled={back.isPending}
          className="min-h-11 self-start rounded-md border-2 border-ink bg-card px-4 text-lg font-semibold disabled:opacity-60"
        >
          {back.isPending ? say('move.steppingBack', 'Stepping back…') : say('move.stepBack', `Step back to ${label(prev)}`, { step: label(prev) })}
        </button>
      )}
      <p role="status" className="text-base font-semibold">
        {said}
      </p>
      {back.error && (
        <p role="alert" className="text-base font-semibold text-cut">
          {back.error.message}
        </p>
      )}
    </div>
  );
}
