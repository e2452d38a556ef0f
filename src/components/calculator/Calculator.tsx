import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState } from 'react';
import { CalculatorForm } from './CalculatorForm';

/** The hem-and-cuff calculator island: its own query client around the form and the plan. */
export default function Calculator() {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { refetchOnWindowFocus: false, gcTime: 60_000 } } }),
  );
  return (
    <QueryClientProvider client={client}>
      <CalculatorForm />
    </QueryClientProvider>
  );
}
