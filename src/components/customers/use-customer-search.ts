import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useDebounced } from '@/components/calculator/use-debounced';
import type { CustomerHit } from '@/lib/customer-types';
import { fetchJson } from '@/lib/fetch-json';

/** Customers found by what is typed, asked of the server once typing pauses (250 ms). */
export function useCustomerSearch(typed: string, enabled = true) {
  const q = useDebounced(typed.trim(), 250);
  return useQuery({
    queryKey: ['customer-search', q],
    queryFn: () => fetchJson<CustomerHit[]>(`/api/customers?q=${encodeURIComponent(q)}`),
    enabled,
    placeholderData: keepPreviousData,
  });
}
