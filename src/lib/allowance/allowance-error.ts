/** Why the engine refused an input. */
export type AllowanceErrorCode =
  | 'bad-input'
  | 'empty'
  | 'not-a-length'
  | 'divide-by-zero'
  | 'too-large'
  | 'bad-unit'
  | 'bad-precision'
  | 'missing'
  | 'not-positive'
  | 'negative'
  | 'out-of-range';

/** A refused input: a code for programs, a human message, and the input field when there is one. */
export class AllowanceError extends Error {
  readonly code: AllowanceErrorCode;
  // Declared only, so an error without a field has no `field` key at all.
  declare readonly field?: string;

  constructor(code: AllowanceErrorCode, message: string, field?: string) {
    super(message);
    this.name = 'AllowanceError';
    this.code = code;
    if (field !== undefined) this.field = field;
  }
}

/** True when the value is an AllowanceError (also across bundles, by name and code). */
export function isAllowanceError(e: unknown): e is AllowanceError {
  if (e instanceof AllowanceError) return true;
  return e instanceof Error && e.name === 'AllowanceError' && typeof (e as { code?: unknown }).code === 'string';
}
