// Asks POST /api/plan for a plan through TanStack Query and the shared fetchJson; the last answer stays on screen while
// the next one is on its way, so the numbers never blink out between keystrokes.
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { ApiError, fetchJson } from '@/lib/fetch-json';
import { planRequest, type PlanRequestInput, type PlanResponse } from '@/lib/plan-request';

/** What the calculator makes of one answer: a plan, or the API's message per field. */
export type PlanAnswer =
  | { ok: true; plan: PlanResponse }
  | { ok: false; error: string; fields: Record<string, string> };

const NO_ANSWER = 'The calculator did not answer. Your entries are kept; try again.';

/** Posts one plan request: a plan, or (400/422) the API's message per field; other failures throw. */
export async function askPlan(body: unknown, signal?: AbortSignal): Promise<PlanAnswer> {
  try {
    return { ok: true, plan: await fetchJson<PlanResponse>('/api/plan', { body, signal }) };
  } catch (e) {
    // 400/422 are answers about the input, not failures: show them beside the fields.
    if (e instanceof ApiError && (e.status === 400 || e.status === 422)) return { ok: false, error: e.message, fields: e.issues };
    if (e instanceof ApiError || signal?.aborted) throw e;
    throw new Error(NO_ANSWER);
  }
}

/** The plan for a request (null = nothing to ask yet); the request is checked with the API's own schema first. */
export function usePlan(request: PlanRequestInput | null) {
  const checked = request ? planRequest.safeParse(request) : null;
  const body = checked?.success ? checked.data : null;
  const query = useQuery({
    queryKey: ['plan', body],
    queryFn: ({ signal }) => askPlan(body, signal),
    enabled: body !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: 1,
  });
  return { ...query, asked: body !== null };
}
