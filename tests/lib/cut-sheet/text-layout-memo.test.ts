// Kept paragraph layouts must never change a sheet: the same page with the memo as without it.
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import { keptLayouts, layoutKey, memoiseTextLayout, nodeLayoutKey, type FontStoreLike, type TextNodeLike } from '@/lib/server/pdf-platform/text-layout-memo';
import { generatedSheets } from '../pdf-platform/generated-sheets';
import { comparable } from './pdf-objects';
import { busyLegs, cuffInch, cuffMetric, hemSloped, sheet, UNSAVED } from './sheets';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';

// Both units, cuff and hem, taper and short cloth, an unsaved plan, A4: every block of the sheet.
const SHEETS: CutSheetData[] = [
  sheet([cuffInch]),
  sheet([cuffMetric], { ticket: '1043', garment: 'Grey worsted suit trousers' }),
  sheet(busyLegs, { ticket: '1044' }),
  sheet([hemSloped], { ticket: '1045', assignee: 'Priya Navarro' }),
  { ...sheet([cuffInch], UNSAVED), pageSize: 'A4' },
];

afterAll(() => memoiseTextLayout(true));

describe('the paragraph layout memo', () => {
  it('renders every sheet exactly as without it, cold and warm, single and batched', async () => {
    memoiseTextLayout(true);
    const cold = await Promise.all(SHEETS.map(async (d) => comparable(await renderCutSheet(d))));
    expect(keptLayouts()).toBeGreaterThan(50);
    const warm = [];
    for (const d of SHEETS) warm.push(comparable(await renderCutSheet(d)));
    const batchWarm = comparable(await renderCutSheets(SHEETS));
    memoiseTextLayout(false);
    const plain = [];
    for (const d of SHEETS) plain.push(comparable(await renderCutSheet(d)));
    const batchPlain = comparable(await renderCutSheets(SHEETS));
    expect(keptLayouts()).toBe(0);
    for (let i = 0; i < SHEETS.length; i++) {
      expect(cold[i]).toEqual(plain[i]);
      expect(warm[i]).toEqual(plain[i]);
    }
    expect(batchWarm).toEqual(batchPlain);
    memoiseTextLayout(true);
  });

  // A loaded font is a class instance (fontkit's); plain objects are settings, compared by content.
  class Face {
    unitsPerEm = 2048;
  }
  const font = new Face();
  const request = (text: string, width: number, fontSize: number) => ({
    text: { string: text, runs: [{ start: 0, end: text.length, attributes: { font: [font], fontSize, color: '#111111', features: { kern: true } } }] },
    container: { x: 0, y: 0, width, height: Infinity, maxLines: undefined, truncateMode: undefined },
    options: { hyphenationPenalty: undefined, shrinkWhitespaceFactor: { before: -0.5, after: -0.5 }, hyphenationCallback: null },
  });

  it('gives two requests the same key only when text, style and box are the same', () => {
    fc.assert(
      fc.property(
        fc.string(),
        fc.string(),
        fc.integer({ min: 1, max: 600 }),
        fc.integer({ min: 1, max: 600 }),
        fc.constantFrom(8, 8.5, 10),
        fc.constantFrom(8, 8.5, 10),
        (t1, t2, w1, w2, f1, f2) => {
          const a = request(t1, w1, f1);
          const b = request(t2, w2, f2);
          const same = t1 === t2 && w1 === w2 && f1 === f2;
          expect(layoutKey(a.text, a.container, a.options) === layoutKey(b.text, b.container, b.options)).toBe(same);
        },
      ),
    );
  });

  it('tells fonts apart by identity and keeps nothing for text flowing round shapes or holding images', () => {
    const a = request('Cuff top', 100, 10);
    const other = { ...a.text, runs: [{ ...a.text.runs[0]!, attributes: { ...a.text.runs[0]!.attributes, font: [new Face()] } }] };
    expect(layoutKey(other, a.container, a.options)).not.toBe(layoutKey(a.text, a.container, a.options));
    expect(layoutKey(a.text, { ...a.container, exclusions: [{ type: 'rect' }] }, a.options)).toBeNull();
    const image = { ...a.text, runs: [{ ...a.text.runs[0]!, attributes: { ...a.text.runs[0]!.attributes, attachment: { width: 10, height: 10 } } }] };
    expect(layoutKey(image, a.container, a.options)).toBeNull();
  });

  it('draws two different sheets, in either order and after others, as each is drawn without the memo', async () => {
    const [a, b] = generatedSheets(2, 90210);
    const both = [a!, b!, SHEETS[2]!];
    memoiseTextLayout(false);
    const plain = [];
    for (const d of both) plain.push(comparable(await renderCutSheet(d)));
    for (const order of [
      [0, 1, 2],
      [2, 1, 0],
      [1, 0, 1, 2, 0],
    ]) {
      memoiseTextLayout(true);
      for (const i of order) expect(comparable(await renderCutSheet(both[i]!)), `sheet ${i} in order ${order}`).toEqual(plain[i]);
    }
  });

  // A text node as react-pdf's layout holds it: a style, text pieces, nested text nodes.
  const fontA = new Face();
  const fontB = new Face();
  const store = (inter: object = fontA): FontStoreLike => ({
    getFont: ({ fontFamily }) => (fontFamily === 'Inter' ? { data: inter } : { data: undefined }),
    getHyphenationCallback: () => null,
    getEmojiSource: () => null,
  });
  const fonts = store();
  const textNode = (text: string, style: Record<string, unknown>, children: TextNodeLike[] = []): TextNodeLike => ({
    type: 'TEXT',
    style: { fontFamily: 'Inter', fontSize: 9, ...style },
    props: {},
    children: [{ type: 'TEXT_INSTANCE', value: text }, ...children],
  });

  it('keys a text node by its text, text style, box and fonts, and not by where it stands', () => {
    fc.assert(
      fc.property(
        fc.string(),
        fc.string(),
        fc.constantFrom(80, 116, 382),
        fc.constantFrom(80, 116, 382),
        fc.constantFrom(9, 10, 14),
        fc.constantFrom(9, 10, 14),
        fc.constantFrom(400, 700, 800),
        fc.constantFrom(400, 700, 800),
        (t1, t2, w1, w2, f1, f2, b1, b2) => {
          const a = nodeLayoutKey(textNode(t1, { fontSize: f1, fontWeight: b1, marginTop: 2 }), w1, Number.NaN, fonts);
          const b = nodeLayoutKey(textNode(t2, { fontSize: f2, fontWeight: b2, left: 84, top: 12 }), w2, Number.NaN, fonts);
          expect(a === b).toBe(t1 === t2 && w1 === w2 && f1 === f2 && b1 === b2);
        },
      ),
    );
  });

  it('tells apart what changes the lines: nested runs, colours, links, line limits, fonts, a font not loaded yet', () => {
    const base = textNode('1 Fold at', { color: '#111111' }, [textNode('cuff top', { fontWeight: 800 })]);
    const key = nodeLayoutKey(base, 200, Number.NaN, fonts);
    expect(key).not.toBeNull();
    const variants: TextNodeLike[] = [
      textNode('1 Fold at', { color: '#111111' }, [textNode('cuff top', { fontWeight: 700 })]),
      textNode('1 Fold at', { color: '#111111' }, [textNode('cuff to', { fontWeight: 800 }), { type: 'TEXT_INSTANCE', value: 'p' }]),
      textNode('1 Fold at', { color: '#b3121b' }, [textNode('cuff top', { fontWeight: 800 })]),
      textNode('1 Fold at', { color: '#111111', maxLines: 1 }, [textNode('cuff top', { fontWeight: 800 })]),
      textNode('1 Fold at', { color: '#111111', letterSpacing: 1 }, [textNode('cuff top', { fontWeight: 800 })]),
      { ...base, props: { href: 'https://cuffwright.example/g/1' } },
    ];
    for (const v of variants) expect(nodeLayoutKey(v, 200, Number.NaN, fonts)).not.toBe(key);
    expect(nodeLayoutKey(base, 200, 40, fonts)).not.toBe(key);
    expect(nodeLayoutKey(base, 200, Number.NaN, store(fontB))).not.toBe(key);
    expect(nodeLayoutKey(base, 200, Number.NaN, { ...store(), getFont: () => ({ data: undefined }) })).not.toBe(key);
    expect(nodeLayoutKey(base, 200, Number.NaN, { ...store(), getHyphenationCallback: () => (w: string) => [w] })).not.toBe(key);
  });

  it('tells strings apart by where they end, whatever separators they hold', () => {
    // Each string is a step of its own in the key's path: text that holds a separator cannot pass for another split.
    fc.assert(
      fc.property(fc.string(), fc.string(), fc.string(), fc.string(), (a1, b1, a2, b2) => {
        const one = nodeLayoutKey(textNode(a1, { color: b1 }), 100, Number.NaN, fonts);
        const two = nodeLayoutKey(textNode(a2, { color: b2 }), 100, Number.NaN, fonts);
        expect(one === two).toBe(a1 === a2 && b1 === b2);
      }),
      {
        examples: [
          ["1'x;", 'y', '1', "x;1'y"],
          ['a', "1'b;", "a;1'b", ''],
          ['">', '', '', '">'],
        ],
      },
    );
  });

  it('never lets values of different kinds, or a setting and its spelling, share a key', () => {
    const key = (color: unknown, features?: unknown) => nodeLayoutKey(textNode('1 in', { color, fontFeatureSettings: features }), 100, Number.NaN, fonts);
    const values: unknown[] = [undefined, null, '', 'null', 'undefined', 0, '0', 1, '1', true, 'true', false, 'false', Number.NaN, 'NaN'];
    for (const a of values) for (const b of values) expect(key(a) === key(b), `${String(a)} / ${String(b)}`).toBe(Object.is(a, b));
    // A settings object counts by its content, and never as the string it is spelt as.
    const spelt = key('#111111', { tnum: true });
    expect(key('#111111', { tnum: true })).toBe(spelt);
    for (const other of ['{{"tnum":true}', '{"tnum":true}', ['tnum'], { tnum: false }]) expect(key('#111111', other)).not.toBe(spelt);
  });

  it('starts its key tree afresh when it grows too big, forgetting the layouts kept by node, and draws sheets as before', async () => {
    memoiseTextLayout(true);
    const plain = comparable(await renderCutSheet(SHEETS[0]!));
    expect(comparable(await renderCutSheet(SHEETS[0]!))).toEqual(plain);
    const kept = keptLayouts();
    const before = nodeLayoutKey(textNode('Cuff top', {}), 100, Number.NaN, fonts);
    // Each new text adds a couple of maps to the tree: enough of them fill it.
    for (let i = 0; i < 40_000; i++) nodeLayoutKey(textNode(`note ${i}`, {}), 100, Number.NaN, fonts);
    expect(keptLayouts()).toBeLessThan(kept);
    const after = nodeLayoutKey(textNode('Cuff top', {}), 100, Number.NaN, fonts);
    expect(after).not.toBe(before);
    expect(nodeLayoutKey(textNode('Cuff top', {}), 100, Number.NaN, fonts)).toBe(after);
    expect(comparable(await renderCutSheet(SHEETS[0]!))).toEqual(plain);
    memoiseTextLayout(false);
    expect(comparable(await renderCutSheet(SHEETS[0]!))).toEqual(plain);
    memoiseTextLayout(true);
  });

  it('spells a font-feature object again once it changes, though the same object was spelt before', () => {
    const features = { tnum: true, kern: false };
    const node = textNode('42 in', { fontFeatureSettings: features });
    const before = nodeLayoutKey(node, 100, Number.NaN, fonts);
    expect(nodeLayoutKey(node, 100, Number.NaN, fonts)).toBe(before);
    features.kern = true;
    const changed = nodeLayoutKey(node, 100, Number.NaN, fonts);
    expect(changed).not.toBe(before);
    expect(changed).toBe(nodeLayoutKey(textNode('42 in', { fontFeatureSettings: { tnum: true, kern: true } }), 100, Number.NaN, fonts));
    (features as Record<string, boolean>).liga = false;
    expect(nodeLayoutKey(node, 100, Number.NaN, fonts)).not.toBe(changed);
  });

  it('keeps nothing by node for images in text, text round shapes, emoji images or an unknown font family', () => {
    const image = textNode('Cuff', {}, [{ type: 'IMAGE', style: {}, props: {} }]);
    expect(nodeLayoutKey(image, 100, Number.NaN, fonts)).toBeNull();
    expect(nodeLayoutKey({ ...textNode('Cuff', {}), exclusions: [{ type: 'rect' }] }, 100, Number.NaN, fonts)).toBeNull();
    expect(nodeLayoutKey(textNode('Cuff', {}), 100, Number.NaN, { ...store(), getEmojiSource: () => ({ url: 'x' }) })).toBeNull();
    const unknown: FontStoreLike = {
      ...store(),
      getFont: () => {
        throw new Error('Font family not registered');
      },
    };
    expect(nodeLayoutKey(textNode('Cuff', {}), 100, Number.NaN, unknown)).toBeNull();
  });
});
