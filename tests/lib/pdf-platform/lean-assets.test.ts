// The lean asset pass (our patch of @react-pdf/layout) must ask for the same fonts in the same
// order of first asks, only once each, and give generated sheets the same PDF objects; a layout
// package without it turns the patch off with a log line.
import { Font } from '@react-pdf/renderer';
import { afterAll, describe, expect, it } from 'vitest';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { leanAssets } from '@/lib/server/pdf-platform/lean-assets';
import { installPdfPlatform, PDF_PATCHES, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { generatedSheets } from './generated-sheets';
import { expectRefusedWithout } from './refused-install';
import { expectSamePrints, printedObjects } from './printed-objects';

const SHEETS = generatedSheets(12, 9127);

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

type Store = { load: (descriptor: Record<string, unknown>) => Promise<void> };

// The font loads one sheet's layout asks for, in order.
async function loadsOf(index: number): Promise<string[]> {
  const store = Font as unknown as Store;
  const load = store.load;
  const asked: string[] = [];
  store.load = (d) => {
    asked.push(JSON.stringify([d.fontFamily, d.fontStyle, d.fontWeight]));
    return load(d);
  };
  try {
    await renderCutSheet(SHEETS[index]!);
  } finally {
    store.load = load;
  }
  return asked;
}

describe('the lean asset pass', () => {
  it('is installed over the layout version it was written for', () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    expect(pdfPatchStatus().find((s) => s.name === 'lean-assets')).toMatchObject({ on: true, installed: '5.2.0' });
  });

  it('asks for each font once, the same fonts in the order react-pdf first asked for them', async () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    const undo = leanAssets();
    undo();
    const own = await loadsOf(0);
    leanAssets();
    const lean = await loadsOf(0);
    expect(own.length).toBeGreaterThan(100);
    expect(lean.length).toBeLessThan(own.length / 4);
    expect([...new Set(lean)]).toEqual([...new Set(own)]);
  }, 60_000);

  it('gives every generated sheet and a batch the same PDF objects as react-pdf’s own pass', async () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    const lean = await printedObjects(SHEETS);
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on', patches: PDF_PATCHES.filter((p) => p.name !== 'lean-assets') });
    // Overfull sheets (two pages and more) are among them.
    expectSamePrints(lean, await printedObjects(SHEETS));
  }, 180_000);

  it('is refused at install with a log line when the layout package lacks it', () => {
    expectRefusedWithout('lean-assets', 'setLeanAssets', leanAssets);
  });
});
