// The plan for what is typed, from POST /api/plan, with plain React state: the public calculator
// loads neither TanStack Query nor zod for it (issue 12: the page's script ≤ 100 KiB gzip). The
// request is checked first with plan-check.ts (the server's rules and messages, without zod); the
// last answer stays on screen while the next one is on its way, so the numbers never blink out
// between keystrokes; answers are kept by request, so going back to an earlier entry is instant.
import { useEffect, useState } from 'react';
import { checkPlanRequest } from '@/lib/shared/plan-check';
import type { PlanRequestInput } from '@/lib/shared/plan-request';
import { askPlan, type PlanAnswer } from './ask-plan';

export { askPlan, type PlanAnswer };

/** The last request answered (or failed): its key, its answer, or why there was none. */
export interface Settled {
  key: string;
  data?: PlanAnswer;
  error?: Error;
}

/** What a plan hook gives: the answer to show, whether it is still the previous request's, a failure, and whether anything was asked. */
export interface PlanState {
  data?: PlanAnswer;
  isPlaceholderData: boolean;
  error: Error | null;
  asked: boolean;
}

/** Answers kept by request key (a plan is a pure function of its request); the oldest go first. */
const answers = new Map<string, PlanAnswer>();
const KEEP = 100;

function remember(key: string, answer: PlanAnswer): void {
  answers.delete(key);
  answers.set(key, answer);
  if (answers.size > KEEP) answers.delete(answers.keys().next().value!);
}

/**
 * What to show for the request `key` (null: nothing to ask): its kept answer, else the last one
 * settled as a placeholder; a failure only when it is this request's.
 */
export function planState(key: string | null, kept: PlanAnswer | undefined, settled: Settled | null): PlanState {
  if (key !== null && kept) return { data: kept, isPlaceholderData: false, error: null, asked: true };
  if (key !== null && settled?.key === key && settled.error) return { data: undefined, isPlaceholderData: false, error: settled.error, asked: true };
  return { data: settled?.data, isPlaceholderData: settled?.data !== undefined, error: null, asked: key !== null };
}

const RETRY_MS = 1_000;

/** Asks once more after a second when the first try fails (a dropped connection), unless the request was given up. */
async function askTwice(body: unknown, signal: AbortSignal): Promise<PlanAnswer> {
  try {
    return await askPlan(body, signal);
  } catch (e) {
    if (signal.aborted) throw e;
    await new Promise((r) => setTimeout(r, RETRY_MS));
    if (signal.aborted) throw e;
    return askPlan(body, signal);
  }
}

/** The plan for a request (null = nothing to ask yet); a request the server's rules refuse is not sent. */
export function usePlan(request: PlanRequestInput | null): PlanState {
  const checked = request ? checkPlanRequest(request) : null;
  const key = checked?.ok ? JSON.stringify(checked.value) : null;
  const [settled, setSettled] = useState<Settled | null>(null);
  useEffect(() => {
    if (key === null) return;
    const known = answers.get(key);
    if (known) {
      setSettled({ key, data: known });
      return;
    }
    const abort = new AbortController();
    askTwice(JSON.parse(key), abort.signal).then(
      (data) => {
        remember(key, data);
        setSettled({ key, data });
      },
      (error: Error) => {
        if (!abort.signal.aborted) setSettled({ key, error });
      },
    );
    return () => abort.abort();
  }, [key]);
  return planState(key, key === null ? undefined : answers.get(key), settled);
}
