// Asks POST /api/plan for a plan through TanStack Query; the last answer stays on screen while
// the next one is on its way, so the numbers never blink out between keystrokes.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { planRequest, type PlanErrorBody, type PlanRequestInput, type PlanResponse } from '@/lib/plan-request';

/** What the calculator makes of one answer: a plan, or the API's message per field. */
export type PlanAnswer =
  | { ok: true; plan: PlanResponse }
  | { ok: false; error: string; fields: Record<string, string> };

async function postPlan(body: unknown, signal: AbortSignal): Promise<PlanAnswer> {
  const res = await fetch('/api/plan', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(body),
    signal,
  });
  const data = (await res.json().catch(() => null)) as PlanResponse | PlanErrorBody | null;
  if (res.ok && data && !('error' in data)) return { ok: true, plan: data };
  // 400/422 are answers about the input, not failures: show them beside the fields.
  if ((res.status === 400 || res.status === 422) && data && 'error' in data) {
    return { ok: false, error: data.error, fields: data.fields ?? {} };
  }
  throw new Error(data && 'error' in data ? data.error : 'The calculator did not answer. Your entries are kept; try again.');
}

/** The plan for a request (null = nothing to ask yet); the request is checked with the API's own schema first. */
export function usePlan(request: PlanRequestInput | null) {
  const checked = request ? planRequest.safeParse(request) : null;
  const body = checked?.success ? checked.data : null;
  const query = useQuery({
    queryKey: ['plan', body],
    queryFn: ({ signal }) => postPlan(body, signal),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: 1,
  });
  return { ...query, asked: body !== null };
}
