// The engine's refusals of a plan request in the page's language: the API sends each one's code and
// values beside its English (POST /api/plan's 422); an answer without them keeps the server's words.
import type { Translate } from '@/lib/shared/i18n/format';
import { DEFAULT_LANGUAGE, type Language } from '@/lib/shared/i18n/languages';
import { refusalText } from '@/lib/shared/i18n/engine-messages';
import type { PlanAnswer } from './ask-plan';

/**
 * A refused answer's headline and per-field messages: in English the engine's own sentences (they
 * repeat what was typed, which the catalog's code-level message cannot), in another language the
 * catalog's, rendered from the codes where they came along.
 */
export function refusalWords(t: Translate, answer: Extract<PlanAnswer, { ok: false }>, language: Language): { error: string; issues: Record<string, string> } {
  const issues = { ...answer.issues };
  if (language === DEFAULT_LANGUAGE) return { error: answer.error, issues };
  for (const [field, r] of Object.entries(answer.refusals ?? {})) issues[field] = refusalText(t, r, field);
  const first = Object.keys(answer.refusals ?? {})[0];
  const error = answer.refusal ? refusalText(t, answer.refusal, first) : answer.error;
  return { error, issues };
}
