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
  const { modules } = QRCode.create([{ data: text, mode: 'byte' }], { errorCorrectionLevel: 'M', maskPattern: QR_MASK });
  const size = modules.size;
  // Each row's runs of dark modules, merged downwards with the same run in the rows below:
  // about a third fewer shapes for the PDF to draw than one per run.
  const open = new Map<string, { x: number; y: number; w: number; h: number }>();
  const rects: { x: number; y: number; w: number; h: number }[] = [];
  for (let y = 0; y < size; y++) {
    const seen = new Set<string>();
    let x = 0;
    while (x < size) {
      if (!modules.get(y, x)) {
        x++;
        continue;
      }
      const start = x;
      while (x < size && modules.get(y, x)) x++;
      const key = `${start}:${x}`;
      seen.add(key);
      const above = open.get(key);
      if (above && above.y + above.h === y) above.h++;
      else {
        const r = { x: start, y, w: x - start, h: 1 };
        open.set(key, r);
        rects.push(r);
      }
    }
    for (const key of open.keys()) if (!seen.has(key)) open.delete(key);
  }
  const d = rects.map((r) => `M${r.x} ${r.y}h${r.w}v${r.h}h${-r.w}z`).join('');
  return { size, d };
}
