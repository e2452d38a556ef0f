// The split from the first layout needs an export our patch adds to @react-pdf/layout: a
// layout package without it (the patch not applied after an install) must turn the split off with
// a log line, and overfull sheets are then laid out again (tests/lib/cut-sheet/overflow.test.ts).
import { afterAll, describe, expect, it } from 'vitest';
import * as reactPdfLayout from '@react-pdf/layout';
import { installPdfPlatform, PDF_PATCHES, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { splitFromFirstLayout, splitLaidOut } from '@/lib/server/pdf-platform/split-laid-out';

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

describe('splitting a laid-out page', () => {
  it('finds our export in the installed @react-pdf/layout (patches/ applied)', () => {
    expect(typeof (reactPdfLayout as Record<string, unknown>).paginateLaidOutPage).toBe('function');
  });

  it('is refused at install with a log line when the layout package lacks the export, and splitLaidOut answers null', async () => {
    const { paginateLaidOutPage: _left, ...unpatched } = reactPdfLayout as Record<string, unknown>;
    expect(() => splitFromFirstLayout(unpatched)).toThrow(/paginateLaidOutPage.*not applied/);
    const patch = PDF_PATCHES.find((p) => p.name === 'split-laid-out')!;
    uninstallPdfPlatform();
    const lines: string[] = [];
    const status = installPdfPlatform({
      setting: 'on',
      log: (l) => lines.push(l),
      versions: () => patch.writtenFor,
      patches: [{ ...patch, install: () => splitFromFirstLayout(unpatched) }],
    });
    expect(status).toMatchObject([{ name: 'split-laid-out', on: false }]);
    expect(lines).toEqual([expect.stringMatching(/^pdf-platform: split-laid-out skipped: .*paginateLaidOutPage/)]);
    expect(await splitLaidOut({} as never, {} as never)).toBeNull();
  });
});
