// The body of PUT /api/garments/[id]/kind-fitting: a whole-garment kind's fitting as typed. Built
// from the kinds' fields (fitting/kind-adapters.ts), so a new kind's fields are checked here too.
import { z } from 'zod';
import type { Unit } from '@/lib/allowance/types';
import type { AuditEntry } from './bench-types';
import { KIND_ADAPTERS } from './fitting/kind-adapters';
import type { KindAdapter } from './fitting/kind-fields';
import type { WholeGarmentKind } from './fitting/garment-kinds';
import { text } from './text';

function fieldsSchema(adapter: KindAdapter) {
  const shape: Record<string, z.ZodType> = {};
  for (const f of adapter.fields) {
    shape[f.key] =
      f.type === 'choice'
        ? z.union([z.enum(f.options as [string, ...string[]], { error: `Choose one of: ${f.options!.join(', ')}.` }), z.literal('')]).default('')
        : text().trim().max(80, 'Keep a length under 80 characters.').default('');
  }
  // Strict: a key no field of the kind has is a mistake (another kind's field, a typo), not data to keep.
  return z.strictObject(shape, { error: 'Send only the fields of this kind.' });
}

const built = Object.values(KIND_ADAPTERS)
  .filter((a): a is KindAdapter => a !== null)
  .map((a) =>
    z.object({
      kind: z.literal(a.kind),
      unit: z.enum(['in', 'cm', 'mm'], { error: 'Choose in, cm or mm.' }),
      fields: fieldsSchema(a),
    }),
  );

/** A kind's fitting as typed: its kind (must be the garment's), the unit typed in, and its fields as text. */
export const kindFittingRequest = z.discriminatedUnion('kind', built as [(typeof built)[number], ...(typeof built)[number][]], {
  error: 'Say which kind of garment this fitting is for (a skirt or dress).',
});

/** A kind's fitting as sent. */
export type KindFittingInput = z.output<typeof kindFittingRequest>;

/** A saved length of a kind's fitting: as typed, and in exact mm. */
export interface KindSavedLength {
  text: string;
  mm: number;
}

/** A whole-garment kind's fitting as saved and answered (null fields: none saved yet). */
export interface KindFittingView {
  kind: WholeGarmentKind;
  unit: Unit | null;
  /** lengths as typed with their mm, and choices and numbers as typed, by field key */
  values: Record<string, KindSavedLength>;
  choices: Record<string, string>;
  takenAt: string | null;
  takenBy: string | null;
}

/** The fitting as its route answers it: with the garment's history (its fitting's changes, moves and edits), newest first. */
export interface KindFittingAnswer extends KindFittingView {
  history: AuditEntry[];
}
