// One call to POST /api/plan through the shared fetchJson: a plan, or the API's messages about the input.
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';
import type { Refusal } from '@/lib/shared/i18n/engine-messages';
import type { PlanResponse } from '@/lib/shared/plan-request';

/** What the calculator makes of one answer: a plan, or the API's message per field (and the engine's codes, to say them in the page's language). */
export type PlanAnswer =
  | { ok: true; plan: PlanResponse }
  | { ok: false; error: string; issues: Record<string, string>; refusal?: Refusal; refusals?: Record<string, Refusal> };

const NO_ANSWER = 'The calculator did not answer. Your entries are kept; try again.';

/** Posts one plan request: a plan, or (400/422) the API's message per field; other failures throw. */
export async function askPlan(body: unknown, signal?: AbortSignal): Promise<PlanAnswer> {
  try {
    return { ok: true, plan: await fetchJson<PlanResponse>('/api/plan', { body, signal }) };
  } catch (e) {
    // 400/422 are answers about the input, not failures: show them beside the fields.
    if (e instanceof ApiError && (e.status === 400 || e.status === 422)) {
      const { refusal, refusals } = e.body as { refusal?: Refusal; refusals?: Record<string, Refusal> };
      return { ok: false, error: e.message, issues: e.issues, ...(refusal ? { refusal } : {}), ...(refusals ? { refusals } : {}) };
    }
    if (e instanceof ApiError || signal?.aborted) throw e;
    throw new Error(NO_ANSWER);
  }
}
