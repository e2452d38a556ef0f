// The bench steps a garment moves through, in order, and what the shop calls them on screen.
// Plain data so the islands, the services and the counter's notices all read one list.

/** Every garment step, intake to pickup; the order is the work's order. */
export const GARMENT_STEPS = ['received', 'marked', 'cut', 'stitched', 'pressed', 'ready', 'collected'] as const;
/** A garment step. */
export type GarmentStep = (typeof GARMENT_STEPS)[number];

/** The shop's words for each step unless its settings rename them. */
export const DEFAULT_STEP_LABELS: Record<GarmentStep, string> = {
  received: 'Received',
  marked: 'Chalk-marked',
  cut: 'Cut',
  stitched: 'Turned and stitched',
  pressed: 'Pressed',
  ready: 'Ready',
  collected: 'Collected',
};

/** True when the value names a garment step. */
export function isGarmentStep(value: unknown): value is GarmentStep {
  return typeof value === 'string' && (GARMENT_STEPS as readonly string[]).includes(value);
}

/** The step after this one, or null at the end. */
export function nextStep(step: GarmentStep): GarmentStep | null {
  return GARMENT_STEPS[GARMENT_STEPS.indexOf(step) + 1] ?? null;
}

/** The step before this one, or null at the start. */
export function previousStep(step: GarmentStep): GarmentStep | null {
  return GARMENT_STEPS[GARMENT_STEPS.indexOf(step) - 1] ?? null;
}

/** The least advanced of some steps (a ticket stands where its slowest garment stands); 'received' for none. */
export function leastAdvanced(steps: readonly GarmentStep[]): GarmentStep {
  if (steps.length === 0) return 'received';
  return GARMENT_STEPS[Math.min(...steps.map((s) => GARMENT_STEPS.indexOf(s)))]!;
}

/** A step's label with the shop's renames applied (blank renames ignored). */
export function stepLabel(step: GarmentStep, renames: Partial<Record<GarmentStep, string>> = {}): string {
  return renames[step]?.trim() || DEFAULT_STEP_LABELS[step];
}
