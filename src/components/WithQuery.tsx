// Gives an island TanStack Query; the islands of one page share a client, so a change made in one
// (a step marked on the ticket, a hand-over at the counter) refreshes what the others show.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState, type ComponentType } from 'react';

let pageClient: QueryClient | undefined;

function newClient(): QueryClient {
  return new QueryClient({ defaultOptions: { queries: { retry: 1, staleTime: 5_000 } } });
}

/** Wraps a component so it can use TanStack Query hooks. */
export function withQuery<P extends object>(Component: ComponentType<P>) {
  return function WithQuery(props: P) {
    // On the server each render keeps its own cache: one shared there would outlive the request.
    const [client] = useState(() => (typeof window === 'undefined' ? newClient() : (pageClient ??= newClient())));
    return (
      <QueryClientProvider client={client}>
        <Component {...props} />
      </QueryClientProvider>
    );
  };
}
