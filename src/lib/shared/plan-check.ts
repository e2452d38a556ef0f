// The public calculator's check of a plan request before it is sent, without zod (about 40 KiB of
// the page's script): the same rules and messages as the server's schema in plan-request.ts,
// both built from plan-messages.ts; tests/lib/plan-check.test.ts proves they answer alike.
import type { PlanRequest } from './plan-request';
import {
  KIND_MESSAGE,
  lengthMessages,
  MAX_LENGTH_NUMBER,
  MAX_LENGTH_TEXT,
  PLAN_FIELD_NAMES,
  PLAN_FIELDS,
  PRECISION_MESSAGE,
  SHAPE_MESSAGE,
  UNIT_MESSAGE,
  type PlanField,
} from './plan-messages';
import { isUnstorable, UNSTORABLE_MESSAGE } from './unstorable';

/** A checked request as the server's schema would output it (trimmed, blanks dropped), or one message per field at fault. */
export type PlanCheck = { ok: true; value: PlanRequest } | { ok: false; error: string; issues: Record<string, string> };

const UNITS: readonly unknown[] = ['in', 'cm', 'mm'];
const PRECISIONS: readonly unknown[] = [8, 16, 32];

/** What is wrong with one length, by kind: the words come from `LengthWords` (the server's English, or the page's catalog). */
export type LengthFault = keyof ReturnType<typeof lengthMessages> | 'unstorable';

/** The message for one length's fault. */
export type LengthWords = (field: PlanField, fault: LengthFault) => string;

/** The server's English for a length's fault (the schema's own words). */
export const ENGLISH_LENGTH_WORDS: LengthWords = (field, fault) =>
  fault === 'unstorable' ? UNSTORABLE_MESSAGE : lengthMessages(PLAN_FIELD_NAMES[field])[fault];

/** One length: its value as the schema outputs it (undefined when left out), or its first fault. */
function checkLength(v: unknown, needed: boolean): { value?: string | number; fault?: LengthFault } {
  if (v === undefined) return needed ? { fault: 'enter' } : {};
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) return { fault: 'notALength' };
    return Math.abs(v) > MAX_LENGTH_NUMBER ? { fault: 'farTooLarge' } : { value: v };
  }
  if (typeof v !== 'string') return { fault: 'notALength' };
  // In the schema's order: storable, then trimmed and not too long, then (if needed) not blank.
  if (isUnstorable(v)) return { fault: 'unstorable' };
  const t = v.trim();
  if (t.length > MAX_LENGTH_TEXT) return { fault: 'tooLong' };
  if (t === '') return needed ? { fault: 'enter' } : {};
  return { value: t };
}

/** Checks a plan request as POST /api/plan's schema does, with the same messages (or a page's own words for the lengths). */
export function checkPlanRequest(input: unknown, say: LengthWords = ENGLISH_LENGTH_WORDS): PlanCheck {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) return { ok: false, error: SHAPE_MESSAGE, issues: {} };
  const body = input as Record<string, unknown>;
  const kind = body.kind;
  if (typeof kind !== 'string' || !Object.hasOwn(PLAN_FIELDS, kind)) return { ok: false, error: KIND_MESSAGE, issues: { kind: KIND_MESSAGE } };
  const fields: Record<string, string> = {};
  const out: Record<string, unknown> = { kind };
  if (!UNITS.includes(body.unit)) fields.unit = UNIT_MESSAGE;
  else out.unit = body.unit;
  if (body.precision !== undefined && !PRECISIONS.includes(body.precision)) fields.precision = PRECISION_MESSAGE;
  else if (body.precision !== undefined) out.precision = body.precision;
  const { fields: lengths, required } = PLAN_FIELDS[kind as keyof typeof PLAN_FIELDS];
  for (const f of lengths) {
    const { value, fault } = checkLength(body[f], (required as readonly PlanField[]).includes(f));
    if (fault) fields[f] = say(f, fault);
    else if (value !== undefined) out[f] = value;
  }
  const first = Object.values(fields)[0];
  return first === undefined ? { ok: true, value: out as PlanRequest } : { ok: false, error: first, issues: fields };
}
