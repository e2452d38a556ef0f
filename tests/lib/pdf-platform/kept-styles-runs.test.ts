// The speed patches of issue 12's last round change how fast a sheet is made, never what it holds:
// kept resolved styles (with the radius pass keeping styles that name no corner radius), kept
// ToUnicode maps and loads of fonts already loaded answered at once give the very same PDF objects
// (bar the date) as without them, over many generated sheets and a batch; text runs without
// attachments drawn straight give the same objects but for the empty save/restore pairs the
// attachment pass wrote. Each is turned off with a log line where react-pdf lacks its hook.
import { afterAll, describe, expect, it } from 'vitest';
import { Document, Page, renderToBuffer, View } from '@react-pdf/renderer';
import * as reactPdfLayout from '@react-pdf/layout';
import * as reactPdfRender from '@react-pdf/render';
import { createElement } from 'react';
import { registerFonts } from '@/lib/server/cut-sheet/fonts';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import { fastRuns } from '@/lib/server/pdf-platform/fast-runs';
import { loadLoadedAtOnce, rememberResolvedFonts } from '@/lib/server/pdf-platform/font-load';
import { installPdfPlatform, PDF_PATCHES, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { keptStyles, memoiseStyles, styleKey } from '@/lib/server/pdf-platform/style-memo';
import { comparable } from '../cut-sheet/pdf-objects';
import { generatedSheets } from './generated-sheets';

const SHEETS = generatedSheets(12, 9127);
const NEW = ['style-memo', 'cmap-memo', 'font-load', 'fast-runs'];

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

// Every sheet (twice: the second render is answered from the kept styles and maps) and a batch.
async function printAll(): Promise<string[][]> {
  const out: string[][] = [];
  for (const round of [0, 1]) for (const s of SHEETS) out.push(comparable(await renderCutSheet({ ...s, ticket: `${s.ticket}-${round}` })));
  out.push(comparable(await renderCutSheets(SHEETS.slice(0, 6))));
  return out;
}

// With all of them installed the documents are the same whichever patch is being compared:
// printed once, for the first comparison, with the memos emptied by the install before it.
let allPrinted: Promise<string[][]> | null = null;

// With every patch but `without` installed, then with all of them.
async function withAndWithout(without: string): Promise<{ all: string[][]; less: string[][] }> {
  await registerFonts();
  uninstallPdfPlatform();
  installPdfPlatform({ setting: 'on', patches: PDF_PATCHES.filter((p) => p.name !== without) });
  expect(pdfPatchStatus().find((s) => s.name === without)).toBeUndefined();
  const less = await printAll();
  uninstallPdfPlatform();
  installPdfPlatform({ setting: 'on' });
  expect(pdfPatchStatus().find((s) => s.name === without)).toMatchObject({ on: true });
  allPrinted ??= printAll();
  return { all: await allPrinted, less };
}

// A content stream without the empty save/restore pairs (q, then Q on the next line).
const withoutEmptySaves = (objects: string[]) => objects.map((o) => o.replace(/\nq\nQ(?=\n)/g, ''));

describe('kept styles, kept ToUnicode maps, loads answered at once, straight text runs', () => {
  it('are installed over the versions they were written for', () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    for (const name of NEW)
      expect(
        pdfPatchStatus().find((s) => s.name === name),
        name,
      ).toMatchObject({ on: true });
  });

  for (const name of ['style-memo', 'cmap-memo', 'font-load']) {
    it(`${name}: every generated sheet, warm, and a batch come out object for object as without it`, async () => {
      const { all, less } = await withAndWithout(name);
      expect(all.length).toBe(SHEETS.length * 2 + 1);
      for (let i = 0; i < all.length; i++) expect(all[i], `document ${i}`).toEqual(less[i]);
    }, 180_000);
  }

  it('fast-runs: the same objects but for the empty save/restore pairs of the attachment pass', async () => {
    const { all, less } = await withAndWithout('fast-runs');
    for (let i = 0; i < all.length; i++) {
      expect(all[i]!.length, `document ${i}`).toBe(less[i]!.length);
      expect(withoutEmptySaves(all[i]!), `document ${i}`).toEqual(withoutEmptySaves(less[i]!));
    }
    // It did leave pairs out: the pages are shorter by them.
    expect(all[0]!.join('').length).toBeLessThan(less[0]!.join('').length);
  }, 180_000);

  it('keeps a percent corner radius working with styles kept (resolved against the box as before)', async () => {
    const doc = () =>
      createElement(
        Document,
        null,
        createElement(
          Page,
          { size: 'A6' },
          createElement(View, { style: { width: 120, height: 60, borderTopLeftRadius: '50%', borderBottomRightRadius: '25%', backgroundColor: '#336699' } }),
          createElement(View, { style: { width: 80, height: 80, borderTopLeftRadius: 6, borderWidth: 1, borderColor: '#111111' } }),
        ),
      );
    memoiseStyles(false);
    const plain = comparable(await renderToBuffer(doc()));
    memoiseStyles(true);
    try {
      const kept = comparable(await renderToBuffer(doc()));
      const again = comparable(await renderToBuffer(doc()));
      expect(kept).toEqual(plain);
      expect(again).toEqual(plain);
    } finally {
      memoiseStyles(true);
    }
  });

  it('keys a style by its merged contents and page, and keeps none holding something it cannot compare (a nested object, a transform list)', () => {
    const page = { width: 612, height: 792, orientation: 'portrait', dpi: 72, remBase: 18 };
    const a = styleKey(page, [{ margin: 4, color: 'red' }, null, [{ color: '#111111' }]]);
    expect(a).toBe(styleKey(page, { margin: 4, color: '#111111' }));
    expect(a).not.toBe(styleKey({ ...page, width: 595.28 }, { margin: 4, color: '#111111' }));
    expect(a).not.toBe(styleKey(page, { margin: '4', color: '#111111' }));
    expect(styleKey(page, { fontFeatureSettings: { tnum: true } })).not.toBe(styleKey(page, { fontFeatureSettings: { tnum: false } }));
    // A media query's styles are compared by content: the page they are matched against is in the key.
    const query = { '@media max-width: 400': { color: 'red' } };
    expect(styleKey(page, query)).not.toBe(styleKey({ ...page, width: 300 }, query));
    expect(styleKey(page, { a: { nested: { deeper: 1 } } })).toBeNull();
    expect(styleKey(page, { transform: [{ rotate: 3 }] })).toBeNull();
  });

  it('never lets a setting pass for the string it is spelt as, nor values of one kind for another', () => {
    const page = { width: 612, height: 792, orientation: 'portrait', dpi: 72, remBase: 18 };
    expect(styleKey(page, { fontFeatureSettings: { tnum: true } })).not.toBe(styleKey(page, { fontFeatureSettings: '{"tnum":true}' }));
    expect(styleKey(page, { flexGrow: 1 })).not.toBe(styleKey(page, { flexGrow: '1' }));
    expect(styleKey(page, { wrap: true })).not.toBe(styleKey(page, { wrap: 'true' }));
    expect(styleKey(page, { margin: 4, color: 'red' })).not.toBe(styleKey(page, { color: 'red', margin: 4 }));
    expect(styleKey(page, { margin: 4 })).not.toBe(styleKey(page, { margin: 4, color: 'red' }));
  });

  it('starts its key tree afresh when it grows too big, forgetting the kept styles, and draws sheets as before', async () => {
    memoiseStyles(true);
    const plain = comparable(await renderCutSheet(SHEETS[0]!));
    expect(keptStyles()).toBeGreaterThan(20);
    const page = { width: 612, height: 792, orientation: 'portrait', dpi: 72, remBase: 18 };
    const before = styleKey(page, { marginTop: 3 });
    // Each new style adds a map or two to the tree: enough of them fill it.
    for (let i = 0; i < 25_000; i++) styleKey(page, { marginTop: 3, width: i });
    expect(keptStyles()).toBe(0);
    const after = styleKey(page, { marginTop: 3 });
    expect(after).not.toBe(before);
    expect(styleKey(page, { marginTop: 3 })).toBe(after);
    expect(comparable(await renderCutSheet(SHEETS[0]!))).toEqual(plain);
  });

  it('answers a load of a font already loaded at once, and leaves errors and first loads to the store', async () => {
    await registerFonts();
    const calls: unknown[] = [];
    const store = {
      getFont: (d: { fontFamily: string }) => {
        if (d.fontFamily === 'Nope') throw new Error('Font family not registered: Nope');
        return d.fontFamily === 'Loaded' ? { data: {} } : { data: null };
      },
      load: async (d: unknown) => {
        calls.push(d);
      },
    };
    const undo = loadLoadedAtOnce(store);
    await store.load({ fontFamily: 'Loaded' } as never);
    expect(calls).toEqual([]);
    await store.load({ fontFamily: 'Fresh' } as never);
    await store.load({ fontFamily: 'Nope' } as never);
    expect(calls).toEqual([{ fontFamily: 'Fresh' }, { fontFamily: 'Nope' }]);
    undo();
    await store.load({ fontFamily: 'Loaded' } as never);
    expect(calls).toHaveLength(3);
  });

  it('answers which face a family, weight and style resolve to as the store did, until the family changes', () => {
    let asked = 0;
    const face = (weight: number, style = 'normal') => ({ fontWeight: weight, fontStyle: style });
    const store = {
      fontFamilies: { Inter: { sources: [face(400), face(700), face(400, 'italic')] } } as Record<
        string,
        { sources: { fontWeight: number; fontStyle: string }[] }
      >,
      getFont(d: { fontFamily: string; fontWeight?: number; fontStyle?: string }) {
        asked += 1;
        const family = this.fontFamilies[d.fontFamily];
        if (!family) throw new Error(`Font family not registered: ${d.fontFamily}`);
        const ofStyle = family.sources.filter((s) => s.fontStyle === (d.fontStyle ?? 'normal'));
        return ofStyle.find((s) => s.fontWeight === (d.fontWeight ?? 400)) ?? ofStyle[0] ?? null;
      },
    };
    const plain = store.getFont.bind(store);
    const undo = rememberResolvedFonts(store);
    const ask = (fontWeight?: number, fontStyle?: string) => store.getFont({ fontFamily: 'Inter', fontWeight, fontStyle });
    for (const [w, st] of [
      [700, undefined],
      [undefined, undefined],
      [400, 'italic'],
      [800, undefined],
      [undefined, 'oblique'],
    ] as const) {
      const expected = plain({ fontFamily: 'Inter', fontWeight: w, fontStyle: st });
      expect(ask(w, st)).toBe(expected);
      asked = 0;
      expect(ask(w, st)).toBe(expected);
      expect(asked).toBe(0);
    }
    // A face registered later, or the family registered anew, is resolved afresh.
    store.fontFamilies.Inter!.sources.push(face(800));
    expect(ask(800)).toEqual(face(800));
    store.fontFamilies.Inter = { sources: [face(400, 'italic')] };
    expect(ask(400, 'italic')).toBe(store.fontFamilies.Inter.sources[0]);
    expect(() => store.getFont({ fontFamily: 'Nope' })).toThrow(/not registered: Nope/);
    undo();
    asked = 0;
    ask(700);
    expect(asked).toBe(1);
  });

  it('are refused at install, with a log line, where react-pdf lacks their hooks', () => {
    const { setResolveStyleHook: _h, ...layoutWithout } = reactPdfLayout as Record<string, unknown>;
    const { setFastRuns: _r, ...renderWithout } = reactPdfRender as Record<string, unknown>;
    expect(() => fastRuns(renderWithout)).toThrow(/setFastRuns.*not applied/);
    expect(typeof layoutWithout.setFastRadii).toBe('function');
    uninstallPdfPlatform();
    const lines: string[] = [];
    const runs = PDF_PATCHES.find((p) => p.name === 'fast-runs')!;
    const status = installPdfPlatform({
      setting: 'on',
      log: (l) => lines.push(l),
      patches: [
        { ...runs, install: () => fastRuns(renderWithout) },
        { ...runs, name: 'fast-runs-other-version', writtenFor: '4.6.0' },
      ],
    });
    expect(status.map((s) => s.on)).toEqual([false, false]);
    expect(lines).toEqual([
      expect.stringMatching(/^pdf-platform: fast-runs skipped: .*setFastRuns/),
      'pdf-platform: fast-runs-other-version skipped: written for @react-pdf/render 4.6.0, installed 4.7.0',
    ]);
  });
});
