// The forms' own checks (the plan request's, the fitting's zod schema) in the catalog's words: each
// fault by its kind and the field's name in the page's language; the server keeps its English.
import type { LengthFault, LengthWords } from '../plan-check';
import type { MessageKey, Translate } from './format';

/** The calculator's check of a plan request, in the page's language. */
export function catalogLengthWords(t: Translate): LengthWords {
  return (field, fault) => faultText(t, fault, t(`check.field.${field}` as MessageKey));
}

/** One length's fault, the field named `what` (already in the page's language). */
export function faultText(t: Translate, fault: LengthFault, what: string): string {
  return t(`check.${fault}` as MessageKey, { what, whatLower: what.toLowerCase() });
}

// Zod's issue codes as the fitting's length schema raises them (measurement-request.ts).
const ZOD_FAULTS: Record<string, LengthFault> = { invalid_type: 'notALength', too_big: 'tooLong', custom: 'unstorable' };

/** A form error from zod (react-hook-form's `type` is zod's issue code) in the page's language; others (the server's) as they came. */
export function zodLengthText(t: Translate, error: { type?: unknown; message?: string } | undefined, what: string): string | undefined {
  if (!error) return undefined;
  const fault = typeof error.type === 'string' ? ZOD_FAULTS[error.type] : undefined;
  return fault ? faultText(t, fault, what) : error.message;
}
