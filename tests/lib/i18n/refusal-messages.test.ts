// Every refusal the engine can produce has its message in every language, rendered from its code and
// values; where the engine names every figure in its values, English is its own sentence word for word.
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { validateCuffInput, validateHemInput, validateHemTaperInput, validateTaperInput } from '@/lib/allowance';
import { ALLOWANCE_ERROR_CODES, type AllowanceError } from '@/lib/allowance/allowance-error';
import { catalogKeys, translator } from '@/lib/server/i18n/catalog';
import { refusalText } from '@/lib/shared/i18n/engine-messages';
import { LANGUAGES } from '@/lib/shared/i18n/languages';

const ENGINE = new URL('../../../src/lib/allowance/', import.meta.url);
const engineSource = readdirSync(ENGINE)
  .filter((f) => f.endsWith('.ts'))
  .map((f) => readFileSync(new URL(f, ENGINE), 'utf8'))
  .join('\n');

describe('engine refusals through the catalog', () => {
  it('lists every code the engine refuses with, and each has refusal.<code> in every language', () => {
    const used = new Set([...engineSource.matchAll(/new AllowanceError\(\s*'([a-z-]+)'/g)].map((m) => m[1]!));
    expect(used.size).toBeGreaterThan(10);
    for (const code of used) expect(ALLOWANCE_ERROR_CODES, code).toContain(code);
    for (const lang of LANGUAGES) for (const code of ALLOWANCE_ERROR_CODES) expect(catalogKeys(lang), `${lang} ${code}`).toContain(`refusal.${code}`);
  });

  it('has its own words for every rule the engine names (no fallback), in every language', () => {
    const rules = new Set([...engineSource.matchAll(/rule: '([a-z-]+)'/g)].map((m) => m[1]!));
    expect(rules.size).toBeGreaterThanOrEqual(9);
    for (const lang of LANGUAGES) {
      const t = translator(lang);
      const fallback = refusalText(t, { code: 'impossible-shape', values: { rule: 'no-such-rule' } });
      const rangeFallback = refusalText(t, { code: 'out-of-range', values: {} });
      for (const rule of rules) {
        const text = refusalText(t, { code: rule.startsWith('no-leg') || rule === 'places' ? 'out-of-range' : 'impossible-shape', values: { rule } });
        expect([fallback, rangeFallback], `${lang} ${rule}`).not.toContain(text);
      }
    }
  });

  it('renders every code in French without a stray placeholder or English sentence', () => {
    const en = translator('en');
    const fr = translator('fr');
    for (const code of ALLOWANCE_ERROR_CODES) {
      for (const values of [{}, { label: 'Cuff depth' }, { label: 'Cuff depth', inner: 'yes' }] as Record<string, string>[]) {
        const text = refusalText(fr, { code, values }, undefined, values.label ? 'Hauteur du revers' : undefined);
        expect(text, code).not.toMatch(/[{}]|^refusal\./);
        expect(text, code).not.toBe(refusalText(en, { code, values }));
      }
    }
    expect(refusalText(fr, { code: 'not-positive', values: { label: 'Cuff depth' } }, 'cuffDepth')).toBe('Hauteur du revers : doit être supérieur à 0.');
    expect(refusalText(fr, { code: 'not-positive', values: { label: 'Width at the cutting line' } }, 'legs.left.widthAtCut')).toBe(
      'Largeur à la ligne de coupe : doit être supérieur à 0.',
    );
  });

  it('renders in English the engine sentence itself, for refusals whose values name every figure', () => {
    const en = translator('en');
    const refusals: AllowanceError[] = [
      ...validateCuffInput({ unit: 'in', cuffDepth: '' }),
      ...validateCuffInput({ unit: 'in', cuffDepth: '1/4' }),
      ...validateCuffInput({ unit: 'mm', cuffDepth: '900', turnUnder: '-1', hemSection: '0' }),
      ...validateCuffInput({ unit: 'in', cuffDepth: '1 1/2', precision: 5 }),
      ...validateHemInput({ unit: 'in', hemAllowance: '0', turnUnder: '-1/4' }),
      ...validateTaperInput({ unit: 'in', cuffDepth: '1 3/4', widthAtEdge: '8', widthAbove: '9', heightAbove: '10', widthAtCut: '0' }),
      ...validateHemTaperInput({ unit: 'in', hemAllowance: '1 1/2', widthAtEdge: '8', widthAbove: '9', heightAbove: '10', widthAtCut: '0' }),
    ];
    const checked = refusals.filter((r) => r.values?.inner !== 'yes');
    expect(new Set(checked.map((r) => r.code))).toEqual(new Set(['missing', 'out-of-range', 'negative', 'not-positive', 'bad-precision']));
    for (const r of checked) {
      expect(refusalText(en, r)).toBe(r.message);
      // The catalog's English name of each field is the engine's own label.
      expect(refusalText(en, r, r.field)).toBe(r.message);
    }
  });
});
