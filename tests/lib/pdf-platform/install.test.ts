// Installing the PDF speed layer: each patch only over the package version it was written for,
// one log line for each one skipped, none at all when switched off, and every one undone exactly.
import PDFDocument from 'pdfkit';
import { afterAll, describe, expect, it } from 'vitest';
import { registerFonts } from '@/lib/server/cut-sheet/fonts';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { installPdfPlatform, PDF_PATCHES, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { installedVersion } from '@/lib/server/pdf-platform/versions';
import { Font } from '@react-pdf/renderer';
import { flatText, pdfFile } from '../cut-sheet/poppler';
import { cuffInch, sheet } from '../cut-sheet/sheets';

type Proto = Record<string, unknown>;
const docProto = PDFDocument.prototype as Proto;
// pdfkit's own methods, read before anything installs the layer in this file's process.
const ORIGINAL = { font: docProto.font, initFonts: docProto.initFonts, transform: docProto.transform, setColor: docProto._setColorCore, path: docProto.path };
const patched = () =>
  docProto.font !== ORIGINAL.font ||
  docProto.initFonts !== ORIGINAL.initFonts ||
  docProto.transform !== ORIGINAL.transform ||
  docProto._setColorCore !== ORIGINAL.setColor ||
  docProto.path !== ORIGINAL.path;
const inter = () => Font.getFont({ fontFamily: 'Inter', fontWeight: 400, fontStyle: 'normal' }).data as unknown as object;

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

describe('installing the PDF speed patches', () => {
  it('installs every patch over the versions installed here, which are the ones they were written for', async () => {
    await registerFonts();
    expect(patched()).toBe(true);
    for (const p of PDF_PATCHES) expect(installedVersion(p.pkg, p.via), p.name).toBe(p.writtenFor);
    expect(pdfPatchStatus().filter((s) => !s.on)).toEqual([]);
    // Read from the package.json of the copy react-pdf loads (pdfkit and fontkit export no package.json).
    expect(installedVersion('pdfkit', '@react-pdf/renderer')).toBe('0.20.1');
    expect(installedVersion('no-such-package-here')).toBeNull();
  });

  it('turns off a patch whose package is another version, with one log line naming both versions, and keeps the others', async () => {
    await registerFonts();
    uninstallPdfPlatform();
    expect(patched()).toBe(false);
    const lines: string[] = [];
    const status = installPdfPlatform({
      setting: undefined,
      versions: (pkg, via) => (pkg === 'pdfkit' ? '0.21.0' : installedVersion(pkg, via)),
      log: (l) => lines.push(l),
    });
    expect(lines).toEqual([
      'pdf-platform: pdf-streams skipped: written for pdfkit 0.20.1, installed 0.21.0',
      'pdf-platform: pdf-transform skipped: written for pdfkit 0.20.1, installed 0.21.0',
      'pdf-platform: pdf-path skipped: written for pdfkit 0.20.1, installed 0.21.0',
      'pdf-platform: pdf-colors skipped: written for pdfkit 0.20.1, installed 0.21.0',
      'pdf-platform: pdf-font-cache skipped: written for pdfkit 0.20.1, installed 0.21.0',
      'pdf-platform: cmap-memo skipped: written for pdfkit 0.20.1, installed 0.21.0',
    ]);
    expect(status.filter((s) => !s.on).map((s) => s.name)).toEqual(['pdf-streams', 'pdf-transform', 'pdf-path', 'pdf-colors', 'pdf-font-cache', 'cmap-memo']);
    // pdfkit is untouched; fontkit's faces are patched (own answers on the loaded face).
    expect(patched()).toBe(false);
    expect(Object.hasOwn(inter(), 'layout')).toBe(true);
    // And a sheet still prints and reads back.
    expect(flatText(pdfFile(await renderCutSheet(sheet([cuffInch], { ticket: '5150' }))))).toContain('Ticket 5150');
    uninstallPdfPlatform();
    installPdfPlatform();
  });

  it('says so once and installs nothing with PDF_SPEED_PATCHES=off', async () => {
    await registerFonts();
    uninstallPdfPlatform();
    const lines: string[] = [];
    const status = installPdfPlatform({ setting: 'off', log: (l) => lines.push(l) });
    expect(lines).toEqual(['pdf-platform: PDF_SPEED_PATCHES=off, no speed patches installed']);
    expect(status.every((s) => !s.on)).toBe(true);
    expect(patched()).toBe(false);
    for (const key of ['layout', 'unitsPerEm', 'hasGlyphForCodePoint', 'glyphForCodePoint']) expect(Object.hasOwn(inter(), key), key).toBe(false);
    expect(flatText(pdfFile(await renderCutSheet(sheet([cuffInch], { ticket: '5151' }))))).toContain('Ticket 5151');
    uninstallPdfPlatform();
    installPdfPlatform();
  });

  it('skips, with its reason, a patch that throws while installing, and leaves nothing of it behind', () => {
    uninstallPdfPlatform();
    const lines: string[] = [];
    let undone = 0;
    const broken = {
      name: 'broken',
      pkg: 'pdfkit',
      via: '@react-pdf/renderer',
      writtenFor: '0.20.1',
      install: () => {
        throw new Error('no such method');
      },
    };
    const fine = { name: 'fine', pkg: 'pdfkit', via: '@react-pdf/renderer', writtenFor: '0.20.1', install: () => () => void (undone += 1) };
    const status = installPdfPlatform({ patches: [broken, fine], log: (l) => lines.push(l), setting: 'on' });
    expect(lines).toEqual(['pdf-platform: broken skipped: no such method']);
    expect(status.map((s) => s.on)).toEqual([false, true]);
    uninstallPdfPlatform();
    expect(undone).toBe(1);
    installPdfPlatform();
  });
});
