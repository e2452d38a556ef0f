// A refusal on an English page keeps the engine's own sentence, which repeats what was typed; a
// French page gets the catalog's words for the same code (common practice: say back what was typed).
import { describe, expect, it } from 'vitest';
import { refusalWords } from '@/components/calculator/refusal-words';
import { translator } from '@/lib/server/i18n/catalog';

const sent = '“abc” is not a length. Type a length such as 1 1/2, 1½, 1.5 or 38 mm.';
const answer = {
  ok: false as const,
  status: 422,
  error: sent,
  issues: { cuffDepth: sent },
  refusal: { code: 'not-a-length', values: { label: 'Cuff depth', inner: 'yes' } },
  refusals: { cuffDepth: { code: 'not-a-length', values: { label: 'Cuff depth', inner: 'yes' } } },
};

describe('refusal words', () => {
  it('keep the engine’s sentence, with what was typed, on an English page', () => {
    expect(refusalWords(translator('en'), answer, 'en')).toEqual({ error: sent, issues: { cuffDepth: sent } });
  });

  it('come from the catalog on a French page', () => {
    const fr = refusalWords(translator('fr'), answer, 'fr');
    expect(fr.issues.cuffDepth).not.toBe(sent);
    expect(fr.issues.cuffDepth).toBe(translator('fr')('refusal.not-a-length', { label: 'Hauteur du revers', inner: 'yes' }));
  });
});
