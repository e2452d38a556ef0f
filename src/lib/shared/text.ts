// The one text schema every request uses: PostgreSQL (and PGlite) refuse a NUL character in text,
// and jsonb refuses a lone UTF-16 surrogate, so either would fail a write half-way (a 500, and a
// retry that writes twice). Refusing them here answers 422 naming the field before any write.
import { z } from 'zod';
import { isUnstorable, UNSTORABLE_MESSAGE } from './unstorable';

export { isUnstorable, UNSTORABLE_MESSAGE };

/** A string PostgreSQL can keep; chain .trim(), .min(), .max() on it as on z.string(). */
export function text(params?: Parameters<typeof z.string>[0]) {
  return z.string(params).refine((v) => !isUnstorable(v), UNSTORABLE_MESSAGE);
}

/** The path ("name", "members.0.email") of the first string or key in a parsed body PostgreSQL
 * could not keep, or null: for bodies no zod schema of ours reads (better-auth's). */
export function unstorablePath(value: unknown, path: string[] = []): string | null {
  if (typeof value === 'string') return isUnstorable(value) ? path.join('.') || '_' : null;
  if (!value || typeof value !== 'object') return null;
  for (const [key, inner] of Object.entries(value)) {
    if (isUnstorable(key)) return [...path, '_'].join('.');
    const found = unstorablePath(inner, [...path, key]);
    if (found) return found;
  }
  return null;
}
