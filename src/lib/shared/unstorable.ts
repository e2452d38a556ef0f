// Text PostgreSQL (and PGlite) cannot keep: a NUL, or a lone UTF-16 surrogate (jsonb refuses it).
// No zod here, so the public calculator can check text in the browser without loading zod.

// A NUL, or a high surrogate not followed by a low one, or a low surrogate not preceded by a high one.
// biome-ignore lint/suspicious/noControlCharactersInRegex: the NUL is what is refused
const UNSTORABLE = /\u0000|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** Why a text cannot be kept. */
export const UNSTORABLE_MESSAGE = 'Remove the hidden character (a NUL or a broken emoji) from this field.';

/** True when the text holds a NUL or a lone surrogate (nothing PostgreSQL could keep). */
export function isUnstorable(value: string): boolean {
  return UNSTORABLE.test(value);
}
