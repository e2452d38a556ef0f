// Reads a PDF's objects and streams back in plain Node, for tests that compare two renders.
import { inflateSync } from 'node:zlib';

/** One indirect object: its number, dictionary text and (inflated) stream, if any. */
export interface PdfObject {
  id: number;
  dict: string;
  stream: Buffer | null;
}

/** Every indirect object of a PDF written by pdfkit (no object streams, no encryption). */
export function pdfObjects(pdf: Uint8Array): PdfObject[] {
  const buf = Buffer.from(pdf);
  const text = buf.toString('latin1');
  const out: PdfObject[] = [];
  const head = /(\d+) 0 obj\n/g;
  for (let m = head.exec(text); m; m = head.exec(text)) {
    const start = m.index + m[0].length;
    const end = text.indexOf('\nendobj', start);
    const body = text.slice(start, end);
    const at = body.indexOf('\nstream\n');
    if (at < 0) {
      out.push({ id: Number(m[1]), dict: body, stream: null });
      continue;
    }
    const dict = body.slice(0, at);
    const length = Number(/\/Length (\d+)/.exec(dict)?.[1]);
    const raw = buf.subarray(start + at + 8, start + at + 8 + length);
    out.push({ id: Number(m[1]), dict, stream: dict.includes('/FlateDecode') ? inflateSync(raw) : Buffer.from(raw) });
  }
  return out;
}

/** The objects with the render's date taken out: what two renders of one sheet must share. */
export function comparable(pdf: Uint8Array): string[] {
  return pdfObjects(pdf).map((o) => {
    const dict = o.dict.replace(/\(D:\d+Z\)/g, '(D:…)').replace(/\/Length \d+/, '');
    return `${o.id} ${dict} ${o.stream ? o.stream.toString('latin1') : ''}`;
  });
}
