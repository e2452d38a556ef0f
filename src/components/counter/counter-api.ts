// The counter panel's queries and mutations: one place for the URLs and the cache keys.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NoticeJson as Notice } from '@/lib/shared/counter-views';
import { fetchJson } from '@/lib/shared/fetch-json';
import type { PriceListView } from '@/lib/shared/counter-views';
import type { AsJson } from '@/lib/shared/as-json';
import type { CounterSummaryJson as CounterSummary } from '@/lib/shared/counter-views';

/** The ticket's money: lines, total, payments, balance, link. */
export function useSummary(ticketId: string) {
  return useQuery({ queryKey: ['counter', ticketId], queryFn: () => fetchJson<CounterSummary>(`/api/tickets/${ticketId}/payments`) });
}

// A text's delivery report comes a moment after the send: looked for this long after it.
const REPORT_WAIT_MS = 2 * 60_000;
const awaitingReport = (n: Notice) => n.channel === 'sms' && n.status === 'sent' && !n.delivery && Date.now() - Date.parse(n.sentAt ?? '') < REPORT_WAIT_MS;

/** The ticket's notices; polled while one waits for a retry or a text for its delivery report. */
export function useNotices(ticketId: string) {
  return useQuery({
    queryKey: ['notices', ticketId],
    queryFn: () => fetchJson<Notice[]>(`/api/tickets/${ticketId}/notices`),
    refetchInterval: (q) => (q.state.data?.some((n) => n.status !== 'sent' || awaitingReport(n)) ? 5_000 : false),
  });
}

/** The shop's price list (for "add from the list"). */
export function usePriceList() {
  return useQuery({ queryKey: ['prices'], queryFn: () => fetchJson<AsJson<PriceListView>>('/api/prices') });
}

/** A mutation on the ticket that refreshes the money, the notices and the ticket page's view after it. */
export function useCounterAction<I, O = unknown>(ticketId: string, call: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: call,
    onSettled: () => {
      void client.invalidateQueries({ queryKey: ['counter', ticketId] });
      void client.invalidateQueries({ queryKey: ['notices', ticketId] });
      void client.invalidateQueries({ queryKey: ['ticket', ticketId] });
    },
  });
}

/** POSTs JSON to one of the ticket's counter routes. */
export function post<O>(ticketId: string, path: string, body: unknown = {}): Promise<O> {
  return fetchJson<O>(`/api/tickets/${ticketId}/${path}`, { method: 'POST', body });
}
