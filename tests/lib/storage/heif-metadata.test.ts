// EXIF and XMP out of a HEIC without decoding it: the items' bytes are zeroed where iloc puts them,
// everything else (sizes, offsets, the picture) stays byte for byte; what cannot be read is null.
import { describe, expect, it } from 'vitest';
import { readHeifImage, stripHeifMetadata } from '@/lib/server/storage/heif-metadata';
import { gpsExif, sampleHeif, SAMPLE_EXIF_MAKE, SAMPLE_PICTURE, SAMPLE_XMP_MARK } from './heif-sample';

const has = (hay: Uint8Array, needle: string | Buffer) => Buffer.from(hay).includes(typeof needle === 'string' ? Buffer.from(needle, 'latin1') : needle);

describe('stripHeifMetadata', () => {
  it('zeroes the EXIF (with its GPS block) and the XMP items, and nothing else', async () => {
    const heif = await sampleHeif();
    const exif = await gpsExif();
    expect(has(heif, exif)).toBe(true);
    expect(has(heif, SAMPLE_XMP_MARK)).toBe(true);
    const out = stripHeifMetadata(heif)!;
    expect(out.blanked).toBe(2);
    expect(out.bytes.byteLength).toBe(heif.byteLength);
    expect(has(out.bytes, exif.subarray(6))).toBe(false);
    expect(has(out.bytes, SAMPLE_EXIF_MAKE)).toBe(false);
    expect(has(out.bytes, SAMPLE_XMP_MARK)).toBe(false);
    expect(has(out.bytes, 'GPS')).toBe(false);
    expect(has(out.bytes, SAMPLE_PICTURE)).toBe(true);
    // Exactly the two items' bytes are zero now (the EXIF item starts 4 bytes before its block),
    // and every other byte is as it was: sizes, offsets and the picture.
    const exifAt = heif.indexOf(exif) - 4;
    const xmpAt = heif.indexOf(Buffer.from('<x:xmpmeta', 'latin1'));
    const xmpEnd = heif.indexOf(Buffer.from('</x:xmpmeta>', 'latin1')) + '</x:xmpmeta>'.length;
    const inItem = (i: number) => (i >= exifAt && i < exifAt + 4 + exif.length) || (i >= xmpAt && i < xmpEnd);
    expect([...out.bytes].every((b, i) => (inItem(i) ? b === 0 : b === heif[i]))).toBe(true);
    // The input is left as it was.
    expect(has(heif, SAMPLE_XMP_MARK)).toBe(true);
  });

  it('leaves a HEIF without a meta box or metadata items as it is', () => {
    const ftyp = Buffer.from([0, 0, 0, 16, ...Buffer.from('ftypheic'), 0, 0, 0, 0]);
    const mdat = Buffer.from([0, 0, 0, 12, ...Buffer.from('mdat'), 1, 2, 3, 4]);
    const out = stripHeifMetadata(Buffer.concat([ftyp, mdat]))!;
    expect(out.blanked).toBe(0);
    expect(Buffer.from(out.bytes).equals(Buffer.concat([ftyp, mdat]))).toBe(true);
  });

  it('answers null for boxes that run past the file or are cut short', async () => {
    const heif = await sampleHeif();
    expect(stripHeifMetadata(heif.subarray(0, heif.length - 10))).toBeNull();
    expect(
      stripHeifMetadata(new Uint8Array([0, 0, 0, 24, ...Buffer.from('ftypheic'), 0, 0, 0, 0, ...Buffer.from('mif1heic'), 7, 7, 7, 7, 7, 7, 7, 7, 7])),
    ).toBeNull();
  });
});

describe('readHeifImage', () => {
  const u32 = (n: number) => Buffer.from([n >>> 24, (n >> 16) & 255, (n >> 8) & 255, n & 255]);
  const ftyp = Buffer.concat([u32(24), Buffer.from('ftypheic', 'latin1'), u32(0), Buffer.from('mif1heic', 'latin1')]);

  it('reads a well-formed still: a pict handler, a primary hvc1 item placed in the file, its ispe size', async () => {
    expect(readHeifImage(await sampleHeif())).toEqual({ width: 4032, height: 3024 });
    expect(readHeifImage(await sampleHeif({ width: 16000, height: 16000 }))).toEqual({ width: 16000, height: 16000 });
  });

  it('is null for a HEIC header followed by anything else: HTML, nothing, zeros', () => {
    for (const tail of [Buffer.from('<html><script>alert(1)</script></html>'), Buffer.alloc(0), Buffer.alloc(64)]) {
      expect(readHeifImage(Buffer.concat([ftyp, tail]))).toBeNull();
    }
  });

  it('is null when a required part is missing or false: handler, primary item, its place, its size', async () => {
    const good = await sampleHeif();
    const swap = (from: string, to: string) => Buffer.from(good.toString('latin1').replace(from, to), 'latin1');
    expect(readHeifImage(swap('pict', 'vide'))).toBeNull();
    expect(readHeifImage(swap('hvc1', 'Exif'))).toBeNull();
    expect(readHeifImage(swap('ispe', 'free'))).toBeNull();
    expect(readHeifImage(swap('pitm', 'free'))).toBeNull();
    // Cut off inside mdat: the primary item's bytes run past the end of the file.
    expect(readHeifImage(good.subarray(0, good.length - 300))).toBeNull();
  });
});
