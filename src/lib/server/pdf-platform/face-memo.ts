// fontkit answers the same questions about a static font again and again: textkit asks every
// character's font for its units per em and whether it has the glyph, and every PDF's subset
// decodes each glyph's outline anew. The answers never change for a face that has no variations.
import { override } from './override';

interface Glyph {
  _font: object;
  _decode: () => unknown;
}

/** A loaded fontkit face, as far as this memo goes. */
export interface MemoFace {
  unitsPerEm: number;
  hasGlyphForCodePoint: (codePoint: number) => boolean;
  glyphForCodePoint: (codePoint: number) => Glyph;
  getGlyph: (id: number) => Glyph;
  _variationProcessor?: unknown;
}

const faces = new WeakSet<object>();
const decoded = new WeakMap<object, unknown>();
const patchedGlyphs = new Set<object>();

/** Keeps a loaded static face's answers (units per em, glyph coverage, glyph per character, decoded outlines); returns how to give them back. */
export function memoiseFace(face: MemoFace): () => void {
  if (face._variationProcessor || faces.has(face)) return () => undefined;
  faces.add(face);
  const undo: (() => void)[] = [() => faces.delete(face)];
  undo.push(override(face, 'unitsPerEm', face.unitsPerEm));
  const lookup = face.hasGlyphForCodePoint.bind(face);
  // 0 not asked yet, 1 has the glyph, 2 has not; the basic plane covers every character we print.
  const known = new Uint8Array(0x10000);
  undo.push(
    override(face, 'hasGlyphForCodePoint', (cp: number) => {
      if (cp > 0xffff) return lookup(cp);
      let k = known[cp]!;
      if (k === 0) known[cp] = k = lookup(cp) ? 1 : 2;
      return k === 1;
    }),
  );
  // react-pdf asks each run's font for its space and object-replacement glyphs while drawing.
  const glyphFor = face.glyphForCodePoint.bind(face);
  const glyphs = new Map<number, Glyph>();
  undo.push(
    override(face, 'glyphForCodePoint', (cp: number) => {
      let glyph = glyphs.get(cp);
      if (glyph === undefined) glyphs.set(cp, (glyph = glyphFor(cp)));
      return glyph;
    }),
  );
  const proto = Object.getPrototypeOf(face.getGlyph(0)) as Glyph;
  if (!patchedGlyphs.has(proto)) {
    patchedGlyphs.add(proto);
    const decode = proto._decode;
    // The subsetter only reads the decoded glyph (its components); nothing writes to it for a static face.
    const back = override(proto, '_decode', function (this: Glyph) {
      if (!faces.has(this._font)) return decode.call(this);
      if (decoded.has(this)) return decoded.get(this);
      const glyph = decode.call(this);
      decoded.set(this, glyph);
      return glyph;
    });
    undo.push(() => {
      back();
      patchedGlyphs.delete(proto);
    });
  }
  return () => {
    while (undo.length) undo.pop()!();
  };
}
