// The sleeve's live plan on the garment page: where to chalk and cut from the present edge, large;
// each button's move; the vent and the lining; every engine note in the catalog's words, in the
// page's language. Figures are the engine's (docs/KINDS.md "Sleeves shortened at the cuff").
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { LanguageProvider } from '@/components/I18n';
import { SleevePlanView } from '@/components/bench/kinds/SleevePlanView';
import { shortenSleeve, type SleeveInput } from '@/lib/allowance';

const text = (html: string) =>
  html
    .replace(/<[^>]+>/g, ' ')
    .replace(/&#x27;|&#39;/g, "'")
    .replace(/\s+/g, ' ');
const shown = (input: SleeveInput, language: 'en' | 'fr' = 'en') =>
  text(
    renderToStaticMarkup(
      <LanguageProvider language={language}>
        <SleevePlanView plan={{ input, plan: shortenSleeve(input) }} />
      </LanguageProvider>,
    ),
  );

describe('SleevePlanView', () => {
  it('at the cuff: the new edge 1 in above, the cut 1/2 in below the present edge, the buttons up 1 in (docs/KINDS.md; defaults common practice (no source))', () => {
    const s = shown({ unit: 'in', precision: 8, shortenBy: 1, buttonholes: 'decorative', ventLength: 5 });
    expect(s).toContain('At the cuff, keeping the vent and buttons');
    expect(s).toContain('1 New finished edge 1 in above');
    // Cut 1 1/2 in (the default hem) below the new edge: 1/2 in below the present edge.
    expect(s).toContain('2 CUT · Cutting line 1 1/2 in below the new edge 1/2 in below');
    expect(s).toContain('1 + 1 in 1 1/4 in');
    expect(s).toContain('4 + 1 in 3 1/8 in');
    // 5 − 1 = 4 in of vent; 4 − 3 1/8 − 1/2 = 3/8 in of room (margin common practice (no source)).
    expect(s).toContain('Vent after the work: 4 in; room above the top button: 3/8 in.');
    expect(s).toContain('Lining: shorten it 1 in; fold 1/2 in above the edge, ease pleat 1/2 in.');
    expect(s).toContain('The buttonholes are decorative: stitch them again 1 in higher.');
  });

  it('says a vent too short and what fits; working buttonholes send it to the shoulder; in French too', () => {
    expect(shown({ unit: 'in', shortenBy: '1 1/4', buttonholes: 'none', ventLength: 4 })).toContain(
      // Engine example (tests/lib/allowance/sleeve-shorten.test.ts): two fit, or all four 5/16 in apart.
      'The shortened vent is 7/8 in too short for the buttons: sew 2 of them, or set them all 5/16 in apart.',
    );
    const s = shown({ unit: 'mm', shortenBy: 25, buttonholes: 'working' });
    expect(s).toContain('Lower the sleeve head 25 mm: the cuff, the vent and the buttons stay as they are.');
    expect(s).toContain('Working (cut) buttonholes cannot be moved: shorten the sleeve 25 mm from the shoulder instead.');
    expect(s).not.toContain('CUT');
    expect(shown({ unit: 'mm', shortenBy: 25, buttonholes: 'working' }, 'fr')).toContain('Descendez la tête de manche de 25 mm');
  });
});

describe('SleevePlanView on the garment page', () => {
  it('uses only words the garment page sends its island (BENCH_MESSAGES), so none shows as its key', async () => {
    const { readFileSync } = await import('node:fs');
    const { BENCH_MESSAGES } = await import('@/lib/server/i18n/catalog');
    const source = readFileSync(new URL('../../../src/components/bench/kinds/SleevePlanView.tsx', import.meta.url), 'utf8');
    const keys = [...source.matchAll(/\bt\(\s*[`']([^`'$]+)/g)].map((m) => m[1]!);
    expect(keys.length).toBeGreaterThan(10);
    expect(keys.filter((k) => !BENCH_MESSAGES.some((p) => k.startsWith(p)))).toEqual([]);
  });
});
