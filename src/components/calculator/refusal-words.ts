// The engine's refusals of a plan request in the page's language: the API sends each one's code and
// values beside its English (POST /api/plan's 422); an answer without them keeps the server's words.
import type { Translate } from '@/lib/shared/i18n/format';
import { refusalText } from '@/lib/shared/i18n/engine-messages';
import type { PlanAnswer } from './ask-plan';

/** A refused answer's headline and per-field messages, rendered from the catalog where the codes came along. */
export function refusalWords(t: Translate, answer: Extract<PlanAnswer, { ok: false }>): { error: string; issues: Record<string, string> } {
  const issues = { ...answer.issues };
  for (const [field, r] of Object.entries(answer.refusals ?? {})) issues[field] = refusalText(t, r, field);
  const first = Object.keys(answer.refusals ?? {})[0];
  const error = answer.refusal ? refusalText(t, answer.refusal, first) : answer.error;
  return { error, issues };
}
