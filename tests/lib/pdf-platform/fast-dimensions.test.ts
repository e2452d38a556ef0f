// The faster yoga pass (our patch of @react-pdf/layout) must lay out every node exactly as
// react-pdf's own: the same PDF objects, byte for byte bar the date, for many generated sheets
// (one and two legs, tapers, overfull pages split from their layout, both papers, other scripts)
// and a batch; and a layout package without it turns the patch off with a log line.
import { afterAll, describe, expect, it } from 'vitest';
import { fastDimensions } from '@/lib/server/pdf-platform/fast-dimensions';
import { leanYoga } from '@/lib/server/pdf-platform/lean-yoga';
import { installPdfPlatform, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { generatedSheets } from './generated-sheets';
import { expectRefusedWithout } from './refused-install';
import { expectSamePrints, type Printed, printedObjects } from './printed-objects';

const SHEETS = generatedSheets(24, 4711);

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

describe('the faster yoga pass', () => {
  it('is installed with the other patches over the layout version it was written for', () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    expect(pdfPatchStatus().find((s) => s.name === 'fast-dimensions')).toMatchObject({ on: true, installed: '5.2.0' });
  });

  it('gives every generated sheet and a batch the same PDF objects as react-pdf’s own pass', async () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    // The lean pass (lean-yoga.test.ts) takes the place of this one when on: off for both sides here.
    leanYoga()();
    const fast = await printedObjects(SHEETS);
    const undo = fastDimensions();
    undo();
    let own: Printed;
    try {
      own = await printedObjects(SHEETS);
    } finally {
      fastDimensions();
      leanYoga();
    }
    // Overfull sheets (two pages and more) are among them.
    expectSamePrints(fast, own);
  }, 120_000);

  it('is refused at install with a log line when the layout package lacks it', () => {
    expectRefusedWithout('fast-dimensions', 'setFastDimensions', fastDimensions);
  });
});
