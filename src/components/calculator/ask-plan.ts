// One call to POST /api/plan through the shared fetchJson: a plan, or the API's messages about the input.
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';
import type { PlanResponse } from '@/lib/shared/plan-request';

/** What the calculator makes of one answer: a plan, or the API's message per field. */
export type PlanAnswer = { ok: true; plan: PlanResponse } | { ok: false; error: string; issues: Record<string, string> };

const NO_ANSWER = 'The calculator did not answer. Your entries are kept; try again.';

/** Posts one plan request: a plan, or (400/422) the API's message per field; other failures throw. */
export async function askPlan(body: unknown, signal?: AbortSignal): Promise<PlanAnswer> {
  try {
    return { ok: true, plan: await fetchJson<PlanResponse>('/api/plan', { body, signal }) };
  } catch (e) {
    // 400/422 are answers about the input, not failures: show them beside the fields.
    if (e instanceof ApiError && (e.status === 400 || e.status === 422)) return { ok: false, error: e.message, issues: e.issues };
    if (e instanceof ApiError || signal?.aborted) throw e;
    throw new Error(NO_ANSWER);
  }
}
