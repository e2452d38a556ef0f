// The catalog: every key in every language, with the same placeholders; every engine code has its
// message; the languages read Accept-Language as a browser sends it.
import { readFileSync } from 'node:fs';
import { parse, TYPE, type MessageFormatElement } from '@formatjs/icu-messageformat-parser';
import { describe, expect, it } from 'vitest';
import type { CreasePlace, WarningCode } from '@/lib/allowance';
import { WARNING_CODES } from '@/lib/allowance/types';
import { catalogKeys, translator } from '@/lib/server/i18n/catalog';
import { fromAcceptLanguage, intlLocale, LANGUAGES } from '@/lib/shared/i18n/languages';

// The catalogs as written (the build hands the app syntax trees; here the source text is read).
const source = (lang: string): Record<string, string> =>
  JSON.parse(readFileSync(new URL(`../../../src/lib/shared/i18n/messages/${lang}.json`, import.meta.url), 'utf8'));

// Every argument a message reads, with its kind, and the selector keys of each select.
function shape(elements: MessageFormatElement[], out = new Set<string>()): Set<string> {
  for (const e of elements) {
    if (e.type === TYPE.argument || e.type === TYPE.number || e.type === TYPE.date) out.add(`${e.value}`);
    if (e.type === TYPE.select || e.type === TYPE.plural) {
      out.add(`${e.value}:${Object.keys(e.options).sort().join('|')}`);
      for (const o of Object.values(e.options)) shape(o.value, out);
    }
    if (e.type === TYPE.tag) shape(e.children, out);
  }
  return out;
}

describe('the message catalog', () => {
  const en = source('en');

  it('has every English key in every language, and no other', () => {
    for (const lang of LANGUAGES) expect(Object.keys(source(lang)).sort()).toEqual(Object.keys(en).sort());
    expect(catalogKeys('fr').sort()).toEqual(catalogKeys('en').sort());
  });

  it('gives each message the same placeholders and select cases in every language', () => {
    for (const lang of LANGUAGES) {
      const other = source(lang);
      for (const key of Object.keys(en)) expect([key, [...shape(parse(other[key]!))].sort()]).toEqual([key, [...shape(parse(en[key]!))].sort()]);
    }
  });

  it('has no English left in the French catalog where the words differ (a spot check of the trade words)', () => {
    const fr = translator('fr');
    expect(fr('field.cuffDepth')).toBe('Hauteur du revers');
    expect(fr('calc.finish.hem')).toBe('Ourlet simple');
    expect(fr('line.cut')).toBe('Ligne de coupe');
    expect(fr('warning.let-out-exceeds-seam-allowance', { finish: 'cuff', most: '1/4 in', seamAllowance: '1/8 in' })).toContain('couture');
  });

  it('has a message for every engine warning and every crease verdict', () => {
    const warnings: readonly WarningCode[] = WARNING_CODES;
    const places: CreasePlace[] = ['leg-visible', 'at-cuff-top', 'behind-cuff', 'cuff-face', 'inside', 'on-fold', 'cut-away'];
    for (const code of warnings) expect(en[`warning.${code}`], code).toBeTypeOf('string');
    for (const place of places) expect(en[`crease.${place}`], place).toBeTypeOf('string');
  });

  it('formats dates by the language, not a hard-coded locale', () => {
    const day = new Date(Date.UTC(2026, 11, 3, 12));
    const fmt = (l: 'en' | 'fr') => new Intl.DateTimeFormat(intlLocale(l), { day: 'numeric', month: 'long', timeZone: 'UTC' }).format(day);
    expect(fmt('en')).toBe('3 December');
    expect(fmt('fr')).toBe('3 décembre');
  });

  it('picks the language from Accept-Language by weight, else English', () => {
    expect(fromAcceptLanguage('fr-CH, fr;q=0.9, en;q=0.8')).toBe('fr');
    expect(fromAcceptLanguage('de-DE, en;q=0.5, fr;q=0.7')).toBe('fr');
    expect(fromAcceptLanguage('de-DE')).toBe('en');
    expect(fromAcceptLanguage('fr;q=0, en')).toBe('en');
    expect(fromAcceptLanguage(null)).toBe('en');
    expect(fromAcceptLanguage(';;;,q=x')).toBe('en');
  });
});
