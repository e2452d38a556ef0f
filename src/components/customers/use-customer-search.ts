import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useDebounced } from '@/components/calculator/use-debounced';
import type { CustomerHit } from '@/lib/shared/customer-types';
import { fetchJson } from '@/lib/shared/fetch-json';

/** Customers found by what is typed, asked of the server once typing pauses (250 ms). `current`
 * is true only when the answer is for the text as it stands now, so Enter never picks from the
 * answer to an earlier, shorter search. */
export function useCustomerSearch(typed: string, { enabled = true, allowEmpty = false } = {}) {
  const now = typed.trim();
  const q = useDebounced(now, 250);
  const found = useQuery({
    queryKey: ['customer-search', q],
    queryFn: () => fetchJson<CustomerHit[]>(`/api/customers?q=${encodeURIComponent(q)}`),
    enabled: enabled && (allowEmpty || q.length > 0),
    placeholderData: keepPreviousData,
  });
  return { ...found, current: found.isSuccess && !found.isPlaceholderData && q === now };
}
