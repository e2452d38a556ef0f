import { useMaybeT } from '@/components/I18n';
// The queries every bench island shares: the shop's settings and its people.
import { useQuery } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { BenchSettings, Person } from '@/lib/shared/bench-types';
import { fetchJson } from '@/lib/shared/fetch-json';
import { stepLabel, type GarmentStep } from '@/lib/shared/garment-steps';

/** The shop's bench settings (scale, step names). */
export function useBenchSettings() {
  return useQuery({ queryKey: ['bench-settings'], queryFn: () => fetchJson<BenchSettings>('/api/bench-settings'), staleTime: 60_000 });
}

/** The shop's people a garment can be given to. */
export function useAssignees() {
  return useQuery({ queryKey: ['assignees'], queryFn: () => fetchJson<Person[]>('/api/assignees'), staleTime: 60_000 });
}

/** A function naming steps in the shop's own words. */
export function useStepLabel(): (step: GarmentStep) => string {
  const labels = useBenchSettings().data?.stepLabels;
  const t = useMaybeT();
  // The same function until the names or the language change, so the queue's columns are not rebuilt every render.
  // A step the shop renamed keeps its own name; the others are the catalog's (English: DEFAULT_STEP_LABELS).
  return useCallback((step) => (t ? labels?.[step]?.trim() || t(`step.${step}`) : stepLabel(step, labels)), [labels, t]);
}
