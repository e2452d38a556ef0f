// react-pdf hands pdfkit the same fontkit font object for every text run. pdfkit only caches
// fonts named by a string, so for an object it builds a new EmbeddedFont (a subset, metrics)
// on every run and then compares it with the one it has by JSON-stringifying the whole name
// table, about a tenth of a sheet's time. The first font made for an object is the one pdfkit
// would end up using anyway: keep it per document and answer the next runs with it.
import PDFDocument from 'pdfkit';
import { override } from './override';
import { seedSubset, type EmbeddedFontLike } from './subset-memo';

interface FontDoc {
  _font: unknown;
  _fontSource: unknown;
  _fontFamily: unknown;
  fontSize: (size: number) => unknown;
}

/** Makes pdfkit reuse, within one document, the font it already made for the same font object, and load no default font; returns how to undo it. */
export function cacheFontObjects(): () => void {
  const proto = PDFDocument.prototype as FontDoc & { font: (src: unknown, family?: unknown, size?: unknown) => unknown };
  const original = proto.font;
  const made = new WeakMap<object, WeakMap<object, unknown>>();
  const undoFont = override(proto, 'font', function (this: FontDoc, src: unknown, family?: unknown, size?: unknown) {
    if (typeof src !== 'object' || src === null || typeof family === 'string') return original.call(this, src, family, size);
    let mine = made.get(this);
    if (!mine) made.set(this, (mine = new WeakMap()));
    const font = mine.get(src);
    if (font) {
      // What pdfkit's own cache hit does: remember the source and size, use the font as is.
      this._fontSource = src;
      this._fontFamily = null;
      const pt = typeof family === 'number' ? family : size;
      if (typeof pt === 'number') this.fontSize(pt);
      this._font = font;
      return this;
    }
    const out = original.call(this, src, family, size);
    mine.set(src, this._font);
    // A font embedded from a file (not one of the PDF standard fonts) starts its subset seeded
    // (when the subset memo is on: subset-memo.ts).
    if (typeof this._font === 'object' && this._font !== null && 'subset' in this._font) seedSubset(this._font as EmbeddedFontLike);
    return out;
  });
  // Every new document also loads Helvetica as its default font, parsing the whole metrics file
  // (a millisecond a sheet) though react-pdf names a font before every run. Load it only if named.
  const docProto = PDFDocument.prototype as unknown as { initFonts: (font?: unknown, family?: unknown, size?: unknown) => void };
  const initFonts = docProto.initFonts;
  const undoInit = override(docProto, 'initFonts', function (this: unknown, _font?: unknown, family?: unknown, size?: unknown) {
    initFonts.call(this, null, family ?? null, size ?? 12);
  });
  return () => {
    undoInit();
    undoFont();
  };
}
