// Gives an island its own TanStack Query client.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState, type ComponentType } from 'react';

/** Wraps a component so it can use TanStack Query hooks. */
export function withQuery<P extends object>(Component: ComponentType<P>) {
  return function WithQuery(props: P) {
    const [client] = useState(() => new QueryClient({ defaultOptions: { queries: { retry: 1, staleTime: 5_000 } } }));
    return (
      <QueryClientProvider client={client}>
        <Component {...props} />
      </QueryClientProvider>
    );
  };
}
