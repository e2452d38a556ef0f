/** Every code the engine refuses an input with (the catalog has `refusal.<code>` for each, in every language). */
export const ALLOWANCE_ERROR_CODES = [
  'bad-input',
  'empty',
  'not-a-length',
  'divide-by-zero',
  'too-large',
  'bad-unit',
  'bad-precision',
  'missing',
  'not-positive',
  'negative',
  'out-of-range',
  'bad-choice',
  'not-a-number',
  'impossible-shape',
] as const;

/** Why the engine refused an input. */
export type AllowanceErrorCode = (typeof ALLOWANCE_ERROR_CODES)[number];

/** What a refusal names beside its code (a length as text, a number, a field), for the message catalog. */
export type RefusalValues = Readonly<Record<string, string | number>>;

/** A refused input: a code for programs, a human message, and the input field when there is one. */
export class AllowanceError extends Error {
  readonly code: AllowanceErrorCode;
  // Declared only, so an error without a field has no `field` key at all.
  declare readonly field?: string;
  // Declared only as well: the figures a catalog message needs (refusals of the newer kinds carry them).
  declare readonly values?: RefusalValues;

  constructor(code: AllowanceErrorCode, message: string, field?: string, values?: RefusalValues) {
    super(message);
    this.name = 'AllowanceError';
    this.code = code;
    if (field !== undefined) this.field = field;
    if (values !== undefined) this.values = values;
  }
}

/** True when the value is an AllowanceError (also across bundles, by name and code). */
export function isAllowanceError(e: unknown): e is AllowanceError {
  if (e instanceof AllowanceError) return true;
  return e instanceof Error && e.name === 'AllowanceError' && typeof (e as { code?: unknown }).code === 'string';
}
