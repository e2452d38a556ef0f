// One check for the layout patches that need an export our patch of @react-pdf/layout adds: over a
// package without it, the patch throws, and installPdfPlatform skips it with one log line.
import { expect } from 'vitest';
import * as reactPdfLayout from '@react-pdf/layout';
import { installPdfPlatform, PDF_PATCHES, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';

/** Asserts that patch `name` is refused, with a log line naming `exportName`, over a layout package lacking that export. */
export function expectRefusedWithout(name: string, exportName: string, install: (layout: Record<string, unknown>) => () => void): void {
  const { [exportName]: _left, ...unpatched } = reactPdfLayout as Record<string, unknown>;
  expect(() => install(unpatched)).toThrow(new RegExp(`${exportName}.*not applied`));
  const patch = PDF_PATCHES.find((p) => p.name === name)!;
  uninstallPdfPlatform();
  const lines: string[] = [];
  const status = installPdfPlatform({
    setting: 'on',
    log: (l) => lines.push(l),
    versions: () => patch.writtenFor,
    patches: [{ ...patch, install: () => install(unpatched) }],
  });
  expect(status).toMatchObject([{ name, on: false }]);
  expect(lines).toEqual([expect.stringMatching(new RegExp(`^pdf-platform: ${name} skipped: .*${exportName}`))]);
}
