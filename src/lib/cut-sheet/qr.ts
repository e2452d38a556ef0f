// The QR code as one SVG path of dark modules, so react-pdf and HTML draw the same vector.
import QRCode from 'qrcode';

/** A QR code: its size in modules and a path of unit squares, quiet zone not included. */
export interface QrPath {
  size: number;
  d: string;
}

/** Encodes a link as a QR path (error correction M: survives a chalk smudge). */
export function qrPath(text: string): QrPath {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const size = modules.size;
  let d = '';
  for (let y = 0; y < size; y++) {
    let x = 0;
    while (x < size) {
      if (!modules.get(y, x)) {
        x++;
        continue;
      }
      const start = x;
      while (x < size && modules.get(y, x)) x++;
      d += `M${start} ${y}h${x - start}v1h${start - x}z`;
    }
  }
  return { size, d };
}
