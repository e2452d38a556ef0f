// react-pdf sets the fill colour before every text run (some five hundred a sheet) by its hex
// text, and pdfkit parses that text each time: a regular expression for short forms, parseInt,
// and two new arrays mapped and joined into the operator. A sheet names a handful of colours.
// A colour text that pdfkit turns into plain numbers (a hex colour or one of its named colours,
// which are the same in every document; never a document's spot colour, which pdfkit gives as an
// object) is parsed once per process and its numbers' text kept; the same commands are written.
import PDFDocument from 'pdfkit';
import { override } from './override';

interface ColorDoc {
  _normalizeColor: (color: unknown) => unknown;
  _getColorSpace: (color: unknown) => string;
  _setColorSpace: (space: string, stroke: boolean) => unknown;
  _setColorCore: (color: unknown, stroke: boolean) => boolean;
  addContent: (data: string) => unknown;
}

interface Kept {
  space: string;
  numbers: string;
}

/** Colour texts kept at most; a sheet names a handful. */
const KEPT_LIMIT = 256;

/** Makes pdfkit parse each colour text once per process; returns how to undo it. */
export function keepColors(): () => void {
  const proto = PDFDocument.prototype as unknown as ColorDoc;
  const own = proto._setColorCore;
  const kept = new Map<string, Kept>();
  return override(proto, '_setColorCore', function (this: ColorDoc, color: unknown, stroke: boolean) {
    if (typeof color !== 'string') return own.call(this, color, stroke);
    let k = kept.get(color);
    if (k === undefined) {
      const parts = this._normalizeColor(color);
      // Only plain numbers are the same in every document (a spot colour is this document's object).
      if (!Array.isArray(parts) || !parts.every((p) => typeof p === 'number')) return own.call(this, color, stroke);
      if (kept.size >= KEPT_LIMIT) kept.clear();
      kept.set(color, (k = { space: this._getColorSpace(parts), numbers: parts.join(' ') }));
    }
    // What pdfkit's _setColorCore writes for numbers: the colour space, then the colour.
    this._setColorSpace(k.space, stroke);
    this.addContent(`${k.numbers} ${stroke ? 'SCN' : 'scn'}`);
    return true;
  });
}
