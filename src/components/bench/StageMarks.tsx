import { GARMENT_STEPS, type GarmentStep } from '@/lib/shared/garment-steps';

/** A garment's stage in words, after a small row of tacks (one per stage, filled up to this one) as on a ticket's tear-off. */
export function StageMarks({ status, label }: { status: GarmentStep; label: string }) {
  const at = GARMENT_STEPS.indexOf(status);
  // The tacks repeat the words for the eye only: screen readers read the label.
  return (
    <span className="inline-flex items-center gap-2 font-semibold">
      <span aria-hidden="true" data-testid="stage-marks" className="font-normal tracking-tight text-muted whitespace-nowrap">
        {GARMENT_STEPS.map((_, i) => (i <= at ? '●' : '○')).join('')}
      </span>
      <span data-testid="stage-name">{label}</span>
    </span>
  );
}
