// Stepping a garment back one step: the queue's Undo after a tap and the garment page's Step back.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fetchJson } from '@/lib/shared/fetch-json';
import type { GarmentStep } from '@/lib/shared/garment-steps';

/** A mutation moving the garment back from the step it was seen at; everything shown is refreshed after. */
export function useStepBack(garmentId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (from: GarmentStep) => fetchJson<{ status: GarmentStep }>(`/api/garments/${garmentId}/step-back`, { body: { from } }),
    onSuccess: () => client.invalidateQueries(),
  });
}
