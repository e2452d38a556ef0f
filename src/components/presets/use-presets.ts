// The presets the signed-in person sees, and the changes they can make, through the API.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { fetchJson } from '@/lib/shared/fetch-json';
import type { PresetView, presetCreateInput, presetUpdateInput } from '@/lib/shared/preset-settings';

const KEY = ['presets'];

/** House presets (default first) and the person's own. */
export function usePresets() {
  return useQuery({ queryKey: KEY, queryFn: () => fetchJson<PresetView[]>('/api/presets') });
}

/** Adds a preset, then refreshes the list. */
export function useCreatePreset() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: z.input<typeof presetCreateInput>) => fetchJson<PresetView>('/api/presets', { body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: KEY }),
  });
}

/** Changes a preset (or makes it the house default), then refreshes the list. */
export function useUpdatePreset() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: { id: string } & z.input<typeof presetUpdateInput>) =>
      fetchJson<PresetView>(`/api/presets/${id}`, { method: 'PATCH', body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: KEY }),
  });
}

/** Removes a preset, then refreshes the list. */
export function useDeletePreset() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => fetchJson<{ id: string }>(`/api/presets/${id}`, { method: 'DELETE' }),
    onSuccess: () => client.invalidateQueries({ queryKey: KEY }),
  });
}
