// Every PDF embeds a subset of each font it uses, and building one (fontkit re-encoding the
// glyph tables, then deflate) costs about a tenth of a sheet. The subset holds the glyphs in the
// order the text first used them, so two sheets that differ only in a ticket number would still
// get different subsets. A seeded face's fonts therefore start with the same glyphs in the same
// order (the caller's seed: for the sheet, printable ASCII and the few signs it prints), which
// makes the subset of a usual document identical from one PDF to the next: it is encoded and
// compressed once per process. Text outside the seed gets a longer glyph list and a subset of its own.
import { deflateSync } from 'node:zlib';
import { override, sharedPatch } from './override';
import { useDeflated } from './pdf-streams';

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

/** A face's seed: the characters its fonts start with, shaped with the features its text is set with. */
export interface Seed {
  text: string;
  features: object;
}

/** The pdfkit font object made for one face in one document (only the fields touched here). */
export interface EmbeddedFontLike {
  font: { layout: (text: string, features: object) => { glyphs: Glyph[] }; createSubset: () => Subset };
  subset: Subset;
  scale: number;
  widths: number[];
  unicode: number[][];
}

// Encoded subsets kept per face, keyed by the glyph list; a handful per face in practice.
const SUBSET_LIMIT = 64;
const encoded = new WeakMap<object, Map<string, { bytes: Uint8Array; glyphs: number[]; mapping: Record<number, number> }>>();
// The faces whose subsets start seeded (and with what), while the memo is on. A face for another
// script draws only the few characters the main face lacks, and a seed would add unused glyphs.
const seeds = new WeakMap<object, Seed>();

/** Marks a loaded face as one whose subsets are kept, and start with `seed` if given; returns how to undo it. */
export function keepSubsets(face: { createSubset: () => unknown }, seed?: Seed): () => void {
  const undoProto = patchSubset(Object.getPrototypeOf(face.createSubset()) as Subset);
  if (seed) seeds.set(face, seed);
  return () => {
    seeds.delete(face);
    undoProto();
  };
}

// A subset's numbering of its glyph list (glyph id → place), to stand behind a later subset's own.
function numbering(glyphs: number[]): Record<number, number> {
  const mapping: Record<number, number> = {};
  glyphs.forEach((g, i) => (mapping[g] = i));
  return mapping;
}

// A seeded font's state once seeded (its subset's glyph list and mapping, its widths and text),
// kept per face: every document's fonts start from the same seed, so a later one copies it.
interface Seeded {
  seed: Seed;
  scale: number;
  glyphs: number[];
  mapping: Record<number, number>;
  widths: number[];
  unicode: number[][];
}
const seeded = new WeakMap<object, Seeded>();

/** Adds the seed glyphs, in a fixed order, to a font that has not written any text yet (if its face is seeded). */
export function seedSubset(font: EmbeddedFontLike): void {
  const seed = seeds.get(font.font);
  if (!seed) return;
  // A font that has written nothing holds glyph 0 alone: the seed's state is the same every time.
  const fresh = font.subset.glyphs.length === 1 && font.subset.glyphs[0] === 0 && font.widths.length === 1 && font.unicode.length === 1;
  const kept = seeded.get(font.font);
  if (fresh && kept && kept.seed === seed && kept.scale === font.scale) {
    font.subset.glyphs = kept.glyphs.slice();
    // The kept numbering is read through the prototype; glyphs this document adds are its own.
    font.subset.mapping = Object.create(kept.mapping) as Record<number, number>;
    font.widths = kept.widths.slice();
    font.unicode = kept.unicode.slice();
    return;
  }
  // Shaped with the text's own features, so the glyphs are the ones its text will use (tabular digits).
  for (const glyph of font.font.layout(seed.text, seed.features).glyphs) {
    if (glyph.id === 0) continue;
    const gid = font.subset.includeGlyph(glyph.id);
    // What pdfkit records the first time a glyph is written: its width and the text it stands for.
    font.widths[gid] ??= glyph.advanceWidth * font.scale;
    font.unicode[gid] ??= glyph.codePoints;
  }
  if (fresh)
    seeded.set(font.font, {
      seed,
      scale: font.scale,
      glyphs: font.subset.glyphs.slice(),
      mapping: numbering(font.subset.glyphs),
      widths: font.widths.slice(),
      unicode: font.unicode.slice(),
    });
}

// Faces share their subset class: patched once, and given back when the last face lets go.
const users = new Map<object, { count: number; undo: () => void }>();

function patchSubset(proto: Subset): () => void {
  return sharedPatch(users, proto, () => {
    const encode = proto.encode;
    const undo = override(proto, 'encode', function (this: Subset) {
      let kept = encoded.get(this.font);
      if (!kept) encoded.set(this.font, (kept = new Map()));
      const key = this.glyphs.join(',');
      let hit = kept.get(key);
      if (!hit) {
        if (kept.size >= SUBSET_LIMIT) kept.clear();
        const bytes = encode.call(this);
        // Encoding may add the parts of composite glyphs: keep the list as it ends.
        hit = { bytes, glyphs: [...this.glyphs], mapping: numbering(this.glyphs) };
        kept.set(key, hit);
        // Compressed once at zlib's default level: the font file is the largest stream and is reused.
        useDeflated(bytes, deflateSync(bytes));
        return bytes;
      }
      this.glyphs = [...hit.glyphs];
      this.mapping = Object.create(hit.mapping) as Record<number, number>;
      return hit.bytes;
    });
    return undo;
  });
}
