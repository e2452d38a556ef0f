// The split from the first layout needs an export our patch adds to @react-pdf/layout: a
// layout package without it (the patch not applied after an install) must turn the split off with
// a log line, and overfull sheets are then laid out again (tests/lib/cut-sheet/overflow.test.ts).
import { afterAll, describe, expect, it } from 'vitest';
import * as reactPdfLayout from '@react-pdf/layout';
import { installPdfPlatform, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { splitFromFirstLayout, splitLaidOut } from '@/lib/server/pdf-platform/split-laid-out';
import { expectRefusedWithout } from './refused-install';

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

describe('splitting a laid-out page', () => {
  it('finds our export in the installed @react-pdf/layout (patches/ applied)', () => {
    expect(typeof (reactPdfLayout as Record<string, unknown>).paginateLaidOutPage).toBe('function');
  });

  it('is refused at install with a log line when the layout package lacks the export, and splitLaidOut answers null', async () => {
    expectRefusedWithout('split-laid-out', 'paginateLaidOutPage', splitFromFirstLayout);
    expect(await splitLaidOut({} as never, {} as never)).toBeNull();
  });
});
