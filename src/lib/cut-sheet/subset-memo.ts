// Every PDF embeds a subset of each Inter weight it uses, and building one (fontkit re-encoding
// the glyph tables, then deflate) costs about a tenth of a sheet. The subset holds the glyphs in
// the order the text first used them, so two sheets that differ only in a ticket number would
// still get different subsets. Each new font therefore starts with the same glyphs in the same
// order (the printable ASCII set and the few signs a sheet prints), which makes the subset of a
// usual sheet identical from one PDF to the next: it is encoded and compressed once per process.
// A sheet with a character outside that set gets a longer glyph list and a subset of its own.

import { deflateSync } from 'node:zlib';
import { compressStreamsFast, useDeflated } from './pdf-streams';
import { SHEET_FEATURES } from './shaping-features';

interface Glyph {
  id: number;
  advanceWidth: number;
  codePoints: number[];
}

interface Subset {
  font: object;
  glyphs: number[];
  mapping: Record<number, number>;
  includeGlyph: (glyph: number | Glyph) => number;
  encode: () => Uint8Array;
}

/** The pdfkit font object made for one face in one document (only the fields touched here). */
export interface EmbeddedFontLike {
  font: { layout: (text: string, features: object) => { glyphs: Glyph[] }; createSubset: () => Subset };
  subset: Subset;
  scale: number;
  widths: number[];
  unicode: number[][];
  document: { _root: object };
}

/** Characters every font in a sheet starts with: printable ASCII and the signs the sheet uses. */
export const SEED_CHARACTERS = `${Array.from({ length: 0x7f - 0x20 }, (_, i) => String.fromCharCode(0x20 + i)).join('')}·–—−×•▼→½¼¾⅛⅜⅝⅞`;

// Encoded subsets kept per face, keyed by the glyph list; a handful per face in practice.
const SUBSET_LIMIT = 64;
const encoded = new WeakMap<object, Map<string, { bytes: Uint8Array; glyphs: number[] }>>();
const patched = new WeakSet<object>();
// The faces whose subsets start seeded: Inter's. A face for another script draws only the few
// characters Inter lacks, and the seed would add a hundred unused Latin glyphs to its subset.
const seeded = new WeakSet<object>();

/** Marks a loaded face as one whose subsets start with the seed glyphs. */
export function seedFace(face: object): void {
  seeded.add(face);
}

/** Adds the seed glyphs, in a fixed order, to a font that has not written any text yet (if its face is seeded). */
export function seedSubset(font: EmbeddedFontLike): void {
  patchSubset(Object.getPrototypeOf(font.subset) as Subset);
  compressStreamsFast(font.document._root);
  if (!seeded.has(font.font)) return;
  // Shaped with the sheet's own features, so the glyphs are the ones its text will use (tabular digits).
  for (const glyph of font.font.layout(SEED_CHARACTERS, SHEET_FEATURES).glyphs) {
    if (glyph.id === 0) continue;
    const gid = font.subset.includeGlyph(glyph.id);
    // What pdfkit records the first time a glyph is written: its width and the text it stands for.
    font.widths[gid] ??= glyph.advanceWidth * font.scale;
    font.unicode[gid] ??= glyph.codePoints;
  }
}

function patchSubset(proto: Subset): void {
  if (patched.has(proto)) return;
  patched.add(proto);
  const encode = proto.encode;
  proto.encode = function (this: Subset) {
    let kept = encoded.get(this.font);
    if (!kept) encoded.set(this.font, (kept = new Map()));
    const key = this.glyphs.join(',');
    let hit = kept.get(key);
    if (!hit) {
      if (kept.size >= SUBSET_LIMIT) kept.clear();
      const bytes = encode.call(this);
      // Encoding may add the parts of composite glyphs: keep the list as it ends.
      hit = { bytes, glyphs: [...this.glyphs] };
      kept.set(key, hit);
      // Compressed once at zlib's default level: the font file is the largest stream and is reused.
      useDeflated(bytes, deflateSync(bytes));
      return bytes;
    }
    this.glyphs = [...hit.glyphs];
    this.mapping = {};
    hit.glyphs.forEach((g, i) => (this.mapping[g] = i));
    return hit.bytes;
  };
}
