// The sheet's QR code, drawn from its rectangles as the PDF draws them, must read back as the link
// it was given (jsQR), whatever the link: the mask is fixed (qr.ts), not chosen per code. The
// HTML's path draws the same rectangles.
import fc from 'fast-check';
import jsQR from 'jsqr';
import QRCode from 'qrcode';
import { describe, expect, it } from 'vitest';
import { QR_MASK, qrCode, qrPath } from '@/lib/server/cut-sheet/qr';

const SCALE = 4;
const QUIET = 4;

// The code's rectangles filled on a white bitmap with a quiet zone; its path ("M x y h w v h h -w z"
// each) must name the same rectangles in the same order.
function draw(text: string): { rgba: Uint8ClampedArray; side: number } {
  const { size, rects } = qrCode(text);
  const { size: pathSize, d } = qrPath(text);
  expect(pathSize).toBe(size);
  const fromPath = [...d.matchAll(/M(\d+) (\d+)h(\d+)v(\d+)h-(\d+)z/g)].map((m) => m.slice(1).map(Number));
  expect(d.replace(/M\d+ \d+h\d+v\d+h-\d+z/g, '')).toBe('');
  expect(fromPath).toEqual(rects.map((r) => [r.x, r.y, r.w, r.h, r.w]));
  const side = (size + 2 * QUIET) * SCALE;
  const rgba = new Uint8ClampedArray(side * side * 4).fill(255);
  for (const { x, y, w, h } of rects) {
    expect(w > 0 && h > 0 && x + w <= size && y + h <= size).toBe(true);
    for (let py = (y + QUIET) * SCALE; py < (y + h + QUIET) * SCALE; py++)
      for (let px = (x + QUIET) * SCALE; px < (x + w + QUIET) * SCALE; px++) rgba.fill(0, (py * side + px) * 4, (py * side + px) * 4 + 3);
  }
  expect(rects.length).toBeGreaterThan(0);
  return { rgba, side };
}

const decoded = (text: string) => {
  const { rgba, side } = draw(text);
  return jsQR(rgba, side, side)?.data;
};

describe('the sheet QR code', () => {
  it('reads back as the garment page link, for ids and addresses of any length', () => {
    fc.assert(
      fc.property(fc.webUrl({ withQueryParameters: false, withFragments: false }), fc.uuid(), (base, id) => {
        const link = `${base}/garments/${id}`;
        expect(decoded(link)).toBe(link);
      }),
      { numRuns: 60 },
    );
  });

  it('reads back links at every QR version a sheet meets (short to long)', () => {
    for (const n of [1, 10, 30, 60, 100, 150, 200]) {
      const link = `https://shop.example/garments/${'a1b2c3d4e5'.repeat(20).slice(0, n)}`;
      expect(decoded(link)).toBe(link);
    }
    for (const link of ['https://shop.example/garments/12345678901234567890', 'https://café.example/garments/ÉTÉ-2026']) expect(decoded(link)).toBe(link);
  });

  it('uses the fixed mask and one byte segment: a garment link keeps the size qrcode would choose', () => {
    const link = 'https://bench.cuffwright.test/garments/7b1f0c2e-9d4a-4e55-8a31-0f2f4c6d8e90';
    const symbol = QRCode.create([{ data: new TextEncoder().encode(link), mode: 'byte' }], { errorCorrectionLevel: 'M', maskPattern: QR_MASK });
    expect(symbol.maskPattern).toBe(QR_MASK);
    expect(qrPath(link).size).toBe(symbol.modules.size);
    expect(symbol.modules.size).toBe(QRCode.create(link, { errorCorrectionLevel: 'M' }).modules.size);
  });
});
