// The QR code as rectangles of dark modules: the PDF draws them as rectangles (one `re` each, a
// fifth of the drawing commands of a path's corners), HTML as one SVG path of the same rectangles.
import QRCode from 'qrcode';

/** One rectangle of dark modules, in modules from the symbol's top left corner. */
export interface QrRect {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** A QR code: its size in modules and its dark rectangles, quiet zone not included. */
export interface QrCode {
  size: number;
  rects: QrRect[];
}

/** A QR code: its size in modules and a path of rectangles, quiet zone not included. */
export interface QrPath {
  size: number;
  d: string;
}

/** Mask pattern of every sheet's QR code: any of the eight reads the same. */
export const QR_MASK = 2;

/** Encodes a link as a QR code's rectangles (error correction M: survives a chalk smudge). */
export function qrCode(text: string): QrCode {
  // A fixed mask and the link as one byte segment: qrcode otherwise builds the symbol under all
  // eight masks and scores each, and searches the cheapest split into digit, letter and byte
  // segments (0.84 ms a code, 0.14 ms so). The best-scored mask only makes finder-like blotches
  // rarer; a split saves a few bits on long runs of digits, no module size on a garment's link
  // (a uuid). tests/lib/cut-sheet/qr.test.ts reads links of every length back.
  const { modules } = QRCode.create([{ data: new TextEncoder().encode(text), mode: 'byte' }], { errorCorrectionLevel: 'M', maskPattern: QR_MASK });
  const size = modules.size;
  const dark = modules.data;
  // Each row's runs of dark modules, merged downwards with the same run in the rows below:
  // about a third fewer shapes for the PDF to draw than one per run. A run is keyed by its
  // start and end as one number (string keys were most of this loop's time).
  let open = new Map<number, QrRect>();
  const rects: QrRect[] = [];
  for (let y = 0; y < size; y++) {
    const next = new Map<number, QrRect>();
    let x = 0;
    while (x < size) {
      if (!dark[y * size + x]) {
        x++;
        continue;
      }
      const start = x;
      while (x < size && dark[y * size + x]) x++;
      const key = start * (size + 1) + x;
      const above = open.get(key);
      if (above && above.y + above.h === y) {
        above.h++;
        next.set(key, above);
      } else {
        const r = { x: start, y, w: x - start, h: 1 };
        next.set(key, r);
        rects.push(r);
      }
    }
    open = next;
  }
  return { size, rects };
}

/** The same QR code as one SVG path of its rectangles ("M x y h w v h h -w z" each). */
export function qrPath(text: string): QrPath {
  const { size, rects } = qrCode(text);
  return { size, d: rects.map((r) => `M${r.x} ${r.y}h${r.w}v${r.h}h${-r.w}z`).join('') };
}
