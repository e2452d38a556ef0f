// The QR code as one SVG path of dark modules, so react-pdf and HTML draw the same vector.
import QRCode from 'qrcode';

/** A QR code: its size in modules and a path of rectangles, quiet zone not included. */
export interface QrPath {
  size: number;
  d: string;
}

/** Mask pattern of every sheet's QR code: any of the eight reads the same. */
export const QR_MASK = 2;

/** Encodes a link as a QR path (error correction M: survives a chalk smudge). */
export function qrPath(text: string): QrPath {
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
  let open = new Map<number, { x: number; y: number; w: number; h: number }>();
  const rects: { x: number; y: number; w: number; h: number }[] = [];
  for (let y = 0; y < size; y++) {
    const next = new Map<number, { x: number; y: number; w: number; h: number }>();
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
  const d = rects.map((r) => `M${r.x} ${r.y}h${r.w}v${r.h}h${-r.w}z`).join('');
  return { size, d };
}
