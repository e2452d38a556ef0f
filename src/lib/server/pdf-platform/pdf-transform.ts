// react-pdf moves pdfkit's origin for every box, line and run of text it draws (translate, a
// transform), some fifteen hundred times a sheet, and pdfkit writes each as six numbers put in an
// array, mapped through its number rounding and joined: a few per cent of a sheet in allocation
// alone. The same matrix arithmetic and the same text (pdfkit's rounding to six decimals, then
// JavaScript's own number to text, as join does), written without the array.
import PDFDocument from 'pdfkit';
import { override } from './override';

interface VectorDoc {
  _ctm: number[];
  addContent: (data: string) => unknown;
  transform: (m11: number, m12: number, m21: number, m22: number, dx: number, dy: number) => unknown;
}

// pdfkit's PDFObject.number, which pdfkit does not export.
function number(n: number): number {
  if (n > -1e21 && n < 1e21) return Math.round(n * 1e6) / 1e6;
  throw new Error(`unsupported number: ${n}`);
}

/** Makes pdfkit's transform write its operator without intermediate arrays; returns how to undo it. */
export function transformFast(): () => void {
  const proto = PDFDocument.prototype as unknown as VectorDoc;
  return override(proto, 'transform', function (this: VectorDoc, m11: number, m12: number, m21: number, m22: number, dx: number, dy: number) {
    if (m11 === 1 && m12 === 0 && m21 === 0 && m22 === 1 && dx === 0 && dy === 0) return this;
    const m = this._ctm;
    const m0 = m[0]!;
    const m1 = m[1]!;
    const m2 = m[2]!;
    const m3 = m[3]!;
    const m4 = m[4]!;
    const m5 = m[5]!;
    m[0] = m0 * m11 + m2 * m12;
    m[1] = m1 * m11 + m3 * m12;
    m[2] = m0 * m21 + m2 * m22;
    m[3] = m1 * m21 + m3 * m22;
    m[4] = m0 * dx + m2 * dy + m4;
    m[5] = m1 * dx + m3 * dy + m5;
    return this.addContent(`${number(m11)} ${number(m12)} ${number(m21)} ${number(m22)} ${number(dx)} ${number(dy)} cm`);
  });
}
