// Every embedded font carries a ToUnicode map (glyph → text, so a PDF's text can be copied and
// searched), which pdfkit writes afresh per font per document: some hundred hex entries built one
// string at a time, then compressed. With seeded subsets (subset-memo.ts) a usual sheet's fonts
// hold the same glyphs for the same text from one PDF to the next, so the map is the same too:
// it is written by pdfkit's own code once per glyph list, kept as bytes, and compressed once.
import { deflateSync } from 'node:zlib';
import PDFDocument from 'pdfkit';
import { override, sharedPatch } from './override';
import { useDeflated } from './pdf-streams';

interface CmapRef {
  end: (chunk: string | Uint8Array) => void;
}

interface EmbeddedFontLike {
  document: { ref: () => CmapRef };
  unicode: unknown[];
  toUnicodeCmap: () => CmapRef;
}

/** Maps kept at most (a handful per face and glyph list in practice); emptied when full. */
const CMAP_LIMIT = 256;
const kept = new Map<string, Uint8Array>();

// The glyph list's text as one key; null for an entry pdfkit's own code would not read.
function unicodeKey(unicode: unknown[]): string | null {
  const parts: string[] = [];
  for (let i = 0; i < unicode.length; i++) {
    const cps = unicode[i];
    if (!Array.isArray(cps)) return null;
    parts.push(cps.join(' '));
  }
  return parts.join(',');
}

// pdfkit's font classes are not exported: the embedded font made for a face in a throwaway document.
function embeddedFontProto(face: object): EmbeddedFontLike {
  const Ctor = PDFDocument as unknown as new (options: object) => { font: (src: object) => unknown; _font: object };
  const doc = new Ctor({ autoFirstPage: false });
  doc.font(face);
  return Object.getPrototypeOf(doc._font) as EmbeddedFontLike;
}

// Faces share pdfkit's font class: patched once, and given back when the last face lets go.
const users = new Map<object, { count: number; undo: () => void }>();

/** Keeps the ToUnicode maps of the fonts pdfkit embeds for this face's class; returns how to undo it. */
export function keepCmaps(face: object): () => void {
  const proto = embeddedFontProto(face);
  return sharedPatch(users, proto, () => {
    const original = proto.toUnicodeCmap;
    const undo = override(proto, 'toUnicodeCmap', function (this: EmbeddedFontLike) {
      const key = unicodeKey(this.unicode);
      if (key === null) return original.call(this);
      let bytes = kept.get(key);
      if (!bytes) {
        // pdfkit's own code writes the map, into a stand-in reference that only records it.
        let text: string | Uint8Array = '';
        const document = this.document;
        this.document = { ref: () => ({ end: (chunk) => void (text = chunk) }) };
        try {
          original.call(this);
        } finally {
          this.document = document;
        }
        // What pdfkit's write makes of a text chunk: its bytes and a newline.
        bytes = typeof text === 'string' ? Buffer.from(`${text}\n`, 'latin1') : text;
        if (kept.size >= CMAP_LIMIT) kept.clear();
        kept.set(key, bytes);
        useDeflated(bytes, deflateSync(bytes));
      }
      const cmap = this.document.ref();
      cmap.end(bytes);
      return cmap;
    });
    return () => {
      kept.clear();
      undo();
    };
  });
}
