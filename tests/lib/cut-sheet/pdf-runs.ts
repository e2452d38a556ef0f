// Every run of text a PDF page draws (one TJ each), with its box and font size, read from the
// content stream in plain Node: where pdftotext -bbox gives words, and cannot tell the space
// inside a run from the gap between two runs, this gives the runs themselves.
import { pdfObjects, type PdfObject } from './pdf-objects';

/** One run of text as drawn: its text, font size and box in points (PDF space, origin bottom left). */
export interface TextRun {
  page: number;
  text: string;
  size: number;
  /** left and right ends of its glyphs' advances, leading and trailing spaces left out */
  x0: number;
  x1: number;
  /** baseline */
  y: number;
}

type Matrix = [number, number, number, number, number, number];
const IDENTITY: Matrix = [1, 0, 0, 1, 0, 0];

function multiply(m: Matrix, n: Matrix): Matrix {
  return [
    m[0] * n[0] + m[1] * n[2],
    m[0] * n[1] + m[1] * n[3],
    m[2] * n[0] + m[3] * n[2],
    m[2] * n[1] + m[3] * n[3],
    m[4] * n[0] + m[5] * n[2] + n[4],
    m[4] * n[1] + m[5] * n[3] + n[5],
  ];
}

const apply = (m: Matrix, x: number, y: number): [number, number] => [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];

interface Font {
  widths: Map<number, number>;
  unicode: Map<number, string>;
}

function parseWidths(dict: string): Map<number, number> {
  const widths = new Map<number, number>();
  const at = dict.indexOf('/W [');
  if (at < 0) return widths;
  // The /W array: "c [w w w]" or "c_first c_last w", nested one level.
  let depth = 0;
  let end = at + 3;
  for (; end < dict.length; end++) {
    if (dict[end] === '[') depth++;
    else if (dict[end] === ']' && --depth === 0) break;
  }
  const tokens = dict.slice(at + 4, end).match(/\[|\]|-?[\d.]+/g) ?? [];
  for (let i = 0; i < tokens.length; ) {
    const first = Number(tokens[i++]);
    if (tokens[i] === '[') {
      i++;
      for (let c = first; tokens[i] !== ']'; c++) widths.set(c, Number(tokens[i++]));
      i++;
    } else {
      const last = Number(tokens[i++]);
      const w = Number(tokens[i++]);
      for (let c = first; c <= last; c++) widths.set(c, w);
    }
  }
  return widths;
}

function parseToUnicode(cmap: string): Map<number, string> {
  const map = new Map<number, string>();
  const text = (hex: string) => String.fromCodePoint(...(hex.match(/.{4}/g) ?? []).map((h) => parseInt(h, 16)));
  for (const block of cmap.matchAll(/beginbfchar([\s\S]*?)endbfchar/g))
    for (const m of block[1]!.matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>/g)) map.set(parseInt(m[1]!, 16), text(m[2]!));
  for (const block of cmap.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
    for (const m of block[1]!.matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>\s*(\[[^\]]*\]|<[0-9a-fA-F]+>)/g)) {
      const lo = parseInt(m[1]!, 16);
      const hi = parseInt(m[2]!, 16);
      if (m[3]!.startsWith('[')) {
        const list = [...m[3]!.matchAll(/<([0-9a-fA-F]+)>/g)].map((x) => text(x[1]!));
        list.forEach((t, k) => map.set(lo + k, t));
      } else {
        const base = parseInt(m[3]!.slice(1, -1), 16);
        for (let c = lo; c <= hi; c++) map.set(c, String.fromCodePoint(base + c - lo));
      }
    }
  }
  return map;
}

function fontsOf(objects: PdfObject[]): Map<string, Font> {
  const byId = new Map(objects.map((o) => [o.id, o]));
  const ref = (dict: string, key: string) => Number(new RegExp(`/${key} (\\d+) 0 R`).exec(dict)?.[1]);
  const fonts = new Map<string, Font>();
  for (const o of objects) {
    for (const m of o.dict.matchAll(/\/(F\d+) (\d+) 0 R/g)) {
      const type0 = byId.get(Number(m[2]));
      if (!type0 || fonts.has(m[1]!)) continue;
      const descendant = byId.get(Number(/\/DescendantFonts \[(\d+) 0 R\]/.exec(type0.dict)?.[1]));
      const cmap = byId.get(ref(type0.dict, 'ToUnicode'));
      fonts.set(m[1]!, { widths: parseWidths(descendant?.dict ?? ''), unicode: parseToUnicode(cmap?.stream?.toString('latin1') ?? '') });
    }
  }
  return fonts;
}

const TOKEN = /\s*(<<|>>|\[|\]|<[0-9a-fA-F\s]*>|\((?:\\.|[^\\)])*\)|\/[^\s/[\]<>()]+|[-+]?(?:\d+\.?\d*|\.\d+)|[A-Za-z'"*]+\d*)/y;

/** The runs of one content stream. */
function runsOf(stream: string, fonts: Map<string, Font>, page: number): TextRun[] {
  const runs: (TextRun & { raw: string; end: number })[] = [];
  const stack: Matrix[] = [];
  let ctm: Matrix = IDENTITY;
  let tm: Matrix = IDENTITY;
  let font: Font | undefined;
  let size = 0;
  const operands: (string | (string | number)[])[] = [];
  let array: (string | number)[] | null = null;
  TOKEN.lastIndex = 0;
  for (let m = TOKEN.exec(stream); m; m = TOKEN.exec(stream)) {
    const t = m[1]!;
    if (t === '[') {
      array = [];
      continue;
    }
    if (t === ']') {
      operands.push(array ?? []);
      array = null;
      continue;
    }
    if (array) {
      array.push(t.startsWith('<') ? t : Number(t));
      continue;
    }
    if (/^[-+.\d]/.test(t) || t.startsWith('/') || t.startsWith('<') || t.startsWith('(')) {
      operands.push(t);
      continue;
    }
    const nums = () => operands.map(Number) as unknown as Matrix;
    switch (t) {
      case 'q':
        stack.push(ctm);
        break;
      case 'Q':
        ctm = stack.pop() ?? IDENTITY;
        break;
      case 'cm':
        ctm = multiply(nums(), ctm);
        break;
      case 'BT':
        tm = IDENTITY;
        break;
      case 'Tm':
        tm = nums();
        break;
      case 'Td': {
        const [x, y] = operands.map(Number);
        tm = multiply([1, 0, 0, 1, x!, y!], tm);
        break;
      }
      case 'Tf':
        font = fonts.get(String(operands[0]).slice(1));
        size = Number(operands[1]);
        break;
      case 'TJ':
      case 'Tj': {
        const items = (t === 'TJ' ? operands[0] : [operands[0]]) as (string | number)[];
        let x = 0;
        let text = '';
        let first: number | null = null;
        let last = 0;
        for (const item of items) {
          if (typeof item === 'number') {
            x -= (item / 1000) * size;
            continue;
          }
          for (const hex of item.slice(1, -1).replace(/\s/g, '').match(/.{4}/g) ?? []) {
            const gid = parseInt(hex, 16);
            const ch = font?.unicode.get(gid) ?? '?';
            const w = ((font?.widths.get(gid) ?? 0) / 1000) * size;
            if (!/^\s$/.test(ch)) {
              first ??= x;
              last = x + w;
            }
            text += ch;
            x += w;
          }
        }
        const m2 = multiply(tm, ctm);
        const [startX, y] = apply(m2, 0, 0);
        const [endX] = apply(m2, x, 0);
        const fontSize = size * Math.hypot(m2[2], m2[3]);
        const prev = runs.at(-1);
        // pdfkit may draw one line of one Text in pieces (a font change, a glyph it positions):
        // a piece that starts exactly where the last one ended, on its baseline, is the same run.
        if (prev && prev.page === page && Math.abs(prev.y - y) < 1e-3 && Math.abs(prev.end - startX) < 1e-3) {
          if (first !== null) {
            if (prev.text === '') prev.x0 = apply(m2, first, 0)[0];
            prev.x1 = apply(m2, last, 0)[0];
          }
          prev.text = `${prev.raw}${text}`.trim();
          prev.raw += text;
          prev.end = endX;
          prev.size = Math.max(prev.size, fontSize);
        } else {
          const [ax] = apply(m2, first ?? 0, 0);
          const [bx] = apply(m2, first === null ? 0 : last, 0);
          runs.push({ page, text: text.trim(), raw: text, size: fontSize, x0: Math.min(ax, bx), x1: Math.max(ax, bx), y, end: endX });
        }
        break;
      }
    }
    operands.length = 0;
  }
  return runs.filter((r) => r.text !== '').map(({ raw: _r, end: _e, ...run }) => run);
}

/** Every text run on every page, in drawing order. */
export function textRuns(pdf: Uint8Array): TextRun[] {
  const objects = pdfObjects(pdf);
  const fonts = fontsOf(objects);
  const byId = new Map(objects.map((o) => [o.id, o]));
  const pages = objects.filter((o) => /\/Type \/Page\b/.test(o.dict));
  return pages.flatMap((p, i) => {
    const ids = [...(/\/Contents (?:\[([^\]]*)\]|(\d+) 0 R)/.exec(p.dict) ?? [])].slice(1).filter(Boolean).join(' ');
    const streams = [...ids.matchAll(/(\d+)(?: 0 R)?/g)].map((m) => byId.get(Number(m[1]))?.stream?.toString('latin1') ?? '');
    return runsOf(streams.join('\n'), fonts, i + 1);
  });
}

/** Pairs of runs on one line (their text heights overlap by half) closer than `gap` points, or overlapping. */
export function crowdedRuns(runs: TextRun[], gap: number): [TextRun, TextRun, number][] {
  const out: [TextRun, TextRun, number][] = [];
  // Inter's ascender and descender, in ems (the font's hhea figures).
  const top = (r: TextRun) => r.y + 0.97 * r.size;
  const bottom = (r: TextRun) => r.y - 0.24 * r.size;
  for (let i = 0; i < runs.length; i++) {
    for (let j = i + 1; j < runs.length; j++) {
      const a = runs[i]!;
      const b = runs[j]!;
      if (a.page !== b.page) continue;
      const overlap = Math.min(top(a), top(b)) - Math.max(bottom(a), bottom(b));
      if (overlap < 0.5 * Math.min(top(a) - bottom(a), top(b) - bottom(b))) continue;
      const apart = Math.max(b.x0 - a.x1, a.x0 - b.x1);
      if (apart < gap) out.push([a, b, apart]);
    }
  }
  return out;
}
