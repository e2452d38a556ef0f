// The history of a garment fitted once (a skirt, a coat's sleeves) on its page: each change of its
// fitting in the kind's own words (the form's labels, a choice by its option), a length as typed
// with the shop's reading when typed in another unit, one save's lines in the form's order, beside
// the garment's moves; in the page's language.
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { LanguageProvider } from '@/components/I18n';
import { KindHistory } from '@/components/bench/KindHistory';
import type { AuditEntry } from '@/lib/shared/bench-types';
import type { WholeGarmentKind } from '@/lib/shared/fitting/garment-kinds';

const text = (html: string) =>
  html
    .replace(/<[^>]+>/g, ' ')
    .replace(/&#x27;|&#39;/g, "'")
    .replace(/\s+/g, ' ');
const lines = (html: string) => [...html.matchAll(/<span class="measure font-semibold">(.*?)<\/span>/g)].map((m) => text(m[1]!).trim());

let n = 0;
const change = (at: string, field: string, old: string | null, now: string | null, unit = 'in', kind: WholeGarmentKind = 'skirt'): AuditEntry => ({
  id: `e${(n += 1)}`,
  at,
  actorName: 'Teodor Vasko',
  action: 'kind-fitting.changed',
  detail: { kind, field, old, new: now, unit },
});
const LATER = '2026-12-04T10:00:00.000Z';
const EARLIER = '2026-12-03T09:00:00.000Z';

const shown = (history: AuditEntry[], kind: WholeGarmentKind = 'skirt', language: 'en' | 'fr' = 'en') =>
  renderToStaticMarkup(
    <LanguageProvider language={language}>
      <KindHistory history={history} kind={kind} label={(s) => s} unit="in" precision={8} />
    </LanguageProvider>,
  );

describe('KindHistory', () => {
  it('says each change of a skirt’s fitting in the form’s words, one save in the form’s order, newest save first, beside a move', () => {
    // Sent in the database's order (random within one moment): the list puts them in the form's order.
    const history = [
      change(LATER, 'hemDepth', '1', '7/8'),
      change(EARLIER, 'pin-centre-front', null, '2 1/4'),
      change(EARLIER, 'hemDepth', null, '1'),
      change(EARLIER, 'flare', null, 'circle'),
      { id: 'm1', at: '2026-12-03T12:00:00.000Z', actorName: 'Teodor Vasko', action: 'garment.moved', detail: { from: 'received', to: 'marked' } },
    ];
    const html = shown(history);
    expect(lines(html)).toEqual([
      'Hem depth wanted: 1 in → 7/8 in',
      'Moved from received to marked',
      'Flare: nothing → Circle skirt: a fraction',
      'Hem depth wanted: nothing → 1 in',
      'Centre front: pins above the edge: nothing → 2 1/4 in',
    ]);
    expect(text(html)).toContain('Teodor Vasko');
  });

  it('reads a length typed in another unit in the shop’s (25 mm = 63/64 in, to the nearest 1/8: 1 in; 1 in = 25.4 mm exactly, NBS 1959)', () => {
    expect(lines(shown([change(LATER, 'hemDepth', null, '25', 'mm')]))).toEqual(['Hem depth wanted: nothing → 25 mm (= 1 in)']);
  });

  it('says a coat’s sleeves in their own words, a choice by its option', () => {
    const html = shown(
      [change(LATER, 'shortenBy', null, '1 1/4', 'in', 'sleeves'), change(LATER, 'buttonholes', null, 'decorative', 'in', 'sleeves')],
      'sleeves',
    );
    expect(lines(html)).toEqual(['Shorten by: nothing → 1 1/4 in', 'Buttonholes: nothing → Decorative: stitched, not cut']);
  });

  it('speaks the page’s language', () => {
    const html = shown([change(LATER, 'hemDepth', '1', null), change(LATER, 'pin-centre-front', null, '2')], 'skirt', 'fr');
    expect(lines(html)).toEqual(['Hauteur d’ourlet voulue : 1 in → rien', 'Milieu devant : épingles au-dessus du bord : rien → 2 in']);
  });
});
