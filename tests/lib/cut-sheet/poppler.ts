// Reads rendered PDFs back with Debian's poppler-utils: text, word boxes, pages, fonts, pixels.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const dir = mkdtempSync(join(tmpdir(), 'cut-sheet-test-'));
let seq = 0;

function run(cmd: string, args: string[]): string {
  const r = spawnSync(cmd, args, { encoding: 'latin1', maxBuffer: 256 * 1024 * 1024 });
  if (r.status !== 0) throw new Error(`${cmd} failed: ${r.stderr}`);
  return r.stdout;
}

/** Writes the bytes to a temporary file and returns its path. */
export function pdfFile(bytes: Uint8Array): string {
  const file = join(dir, `sheet-${++seq}.pdf`);
  writeFileSync(file, bytes);
  return file;
}

/** The text of a page (or all), whitespace collapsed so wrapped lines read as one. */
export function flatText(file: string, page?: number): string {
  const range = page ? ['-f', String(page), '-l', String(page)] : [];
  const r = spawnSync('pdftotext', [...range, file, '-'], { encoding: 'utf8' });
  return r.stdout.replace(/\s+/g, ' ');
}

/** A text without white space, to compare with a PDF's text, which wraps lines anywhere. */
export const squash = (s: string) => s.replace(/\s+/g, '');

/** The text laid out as on the page: table rows stay on one line. */
export function layoutText(file: string): string {
  return spawnSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).stdout;
}

/** Page count and the first page's size in points. */
export function pageInfo(file: string): { pages: number; width: number; height: number } {
  const info = run('pdfinfo', [file]);
  const pages = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
  const size = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(info);
  return { pages, width: Number(size?.[1]), height: Number(size?.[2]) };
}

/** The embedded fonts, one row of pdffonts each. */
export function fonts(file: string): { name: string; embedded: boolean }[] {
  return run('pdffonts', [file])
    .split('\n')
    .slice(2)
    .filter((l) => l.trim())
    .map((l) => {
      const cols = l.trim().split(/\s+/);
      return { name: cols[0] ?? '', embedded: cols[cols.length - 5] === 'yes' };
    });
}

/** A word and its box in points, origin at the top left of the page. */
export interface Word {
  text: string;
  xMin: number;
  yMin: number;
  xMax: number;
  yMax: number;
}

/** Every word on page 1 with its box (pdftotext -bbox). */
export function words(file: string): Word[] {
  const html = spawnSync('pdftotext', ['-bbox', '-f', '1', '-l', '1', file, '-'], { encoding: 'utf8' }).stdout;
  const out: Word[] = [];
  for (const m of html.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)) {
    out.push({ xMin: +m[1]!, yMin: +m[2]!, xMax: +m[3]!, yMax: +m[4]!, text: m[5]!.replace(/&amp;/g, '&') });
  }
  return out;
}

/** A greyscale raster of page 1: width, height and one byte per pixel (0 black, 255 white). */
export interface Gray {
  width: number;
  height: number;
  px: Uint8Array;
  dpi: number;
}

/** Renders page 1 with pdftoppm to PGM at the given resolution. */
export function gray(file: string, dpi: number): Gray {
  const base = join(dir, `page-${++seq}`);
  run('pdftoppm', ['-gray', '-r', String(dpi), '-f', '1', '-l', '1', '-singlefile', file, base]);
  const buf = readFileSync(`${base}.pgm`);
  // P5 header: magic, width, height, maxval, then one whitespace byte.
  const header = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(buf.subarray(0, 64).toString('latin1'));
  if (!header) throw new Error('not a PGM');
  const start = header[0].length;
  return { width: +header[1]!, height: +header[2]!, px: buf.subarray(start), dpi };
}

/** Every page as a greyscale raster (pdftoppm), in page order. */
export function grayPages(file: string, dpi: number): Gray[] {
  const name = `pages-${++seq}`;
  run('pdftoppm', ['-gray', '-r', String(dpi), file, join(dir, name)]);
  return readdirSync(dir)
    .filter((f) => f.startsWith(`${name}-`) && f.endsWith('.pgm'))
    .sort((a, b) => Number(/-(\d+)\.pgm$/.exec(a)![1]) - Number(/-(\d+)\.pgm$/.exec(b)![1]))
    .map((f) => {
      const buf = readFileSync(join(dir, f));
      const header = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(buf.subarray(0, 64).toString('latin1'))!;
      return { width: +header[1]!, height: +header[2]!, px: buf.subarray(header[0].length), dpi };
    });
}

/** Every word on every page with its box (pdftotext -bbox), one string per word. */
export function allWords(file: string): string[] {
  const html = spawnSync('pdftotext', ['-bbox', file, '-'], { encoding: 'utf8' }).stdout;
  return [...html.matchAll(/<page [^>]*>|<word [^>]*>[^<]*<\/word>/g)].map((m) => m[0]);
}
