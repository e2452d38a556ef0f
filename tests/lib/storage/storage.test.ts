// The storage pieces on their own: magic numbers, safe names, keys that cannot leave the root.
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { DiskStorage } from '@/lib/server/storage/disk-storage';
import { isPathLike, safeName } from '@/lib/server/storage/safe-name';
import { sniffImage } from '@/lib/server/storage/sniff-image';
import { checkKey } from '@/lib/server/storage/storage';

const bytes = (...parts: (number[] | string)[]) => new Uint8Array(parts.flatMap((p) => (typeof p === 'string' ? [...Buffer.from(p, 'latin1')] : p)));

describe('sniffImage', () => {
  // Signatures: JPEG FF D8 FF; PNG 89 'PNG' 0D 0A 1A 0A; WebP 'RIFF' size 'WEBP'; HEIF 'ftyp' + brand
  // at offset 4 (from memory of the file format specifications).
  it('knows JPEG, PNG, WebP and HEIC by their first bytes', () => {
    expect(sniffImage(bytes([0xff, 0xd8, 0xff, 0xe1], 'Exif'))?.mime).toBe('image/jpeg');
    expect(sniffImage(bytes([0x89], 'PNG', [0x0d, 0x0a, 0x1a, 0x0a, 0, 0]))?.mime).toBe('image/png');
    expect(sniffImage(bytes('RIFF', [1, 2, 3, 4], 'WEBPVP8 '))?.mime).toBe('image/webp');
    for (const brand of ['heic', 'heix', 'mif1']) expect(sniffImage(bytes([0, 0, 0, 24], 'ftyp', brand, [0, 0, 0, 0]))?.ext).toBe('heic');
  });

  it('knows nothing else: SVG, GIF, AVIF, PDF, a RIFF that is not WebP, a truncated PNG, nothing', () => {
    for (const b of [
      bytes('<svg xmlns="http://www.w3.org/2000/svg"/>'),
      bytes('<?xml version="1.0"?><svg/>'),
      bytes('GIF89a', [1, 0, 1, 0]),
      bytes([0, 0, 0, 24], 'ftypavif', [0, 0, 0, 0]),
      bytes('%PDF-1.7'),
      bytes('RIFF', [1, 2, 3, 4], 'WAVEfmt '),
      bytes([0x89], 'PNG'),
      new Uint8Array(0),
    ]) {
      expect(sniffImage(b)).toBeNull();
    }
  });
});

describe('file names', () => {
  it('are path-like when they carry a folder or are only dots', () => {
    for (const n of ['../x.jpg', '..\\x.jpg', 'a/b.jpg', '/etc/passwd', '..', '.']) expect(isPathLike(n), n).toBe(true);
    for (const n of ['IMG_0042.HEIC', 'left leg (pinned).jpg', '..hidden.jpg', 'a..b.png']) expect(isPathLike(n), n).toBe(false);
  });

  it('keep letters, digits, spaces and ._-() and drop control characters and leading dots', () => {
    expect(safeName('Ärmel links.jpg')).toBe('Ärmel links.jpg');
    expect(safeName('..hidden.jpg')).toBe('hidden.jpg');
    expect(safeName('a\u0000b\u001fc<d>.png')).toBe('abc_d_.png');
    expect(safeName('\u0000')).toBe('photo');
    expect(safeName(`${'x'.repeat(300)}.jpg`)).toHaveLength(100);
  });
});

describe('storage keys and the disk storage', () => {
  const root = mkdtempSync(join(tmpdir(), 'cuffwright-storage-'));
  const disk = new DiskStorage(join(root, 'files'));
  afterAll(() => rmSync(root, { recursive: true, force: true }));

  it('accept only plain relative keys', () => {
    expect(checkKey('shop-1/0b6e.jpg')).toBe('shop-1/0b6e.jpg');
    for (const k of ['../x.jpg', 'shop/../../x.jpg', '/abs.jpg', 'shop//x.jpg', 'shop/x', 'shop/x.jpg/', 'a b.jpg', '']) {
      expect(() => checkKey(k), k).toThrow();
    }
  });

  it('keep, give back and remove bytes, and never write outside the root', async () => {
    await disk.put('s1/a.jpg', new Uint8Array([1, 2, 3]), 'image/jpeg');
    expect([...((await disk.get('s1/a.jpg')) ?? [])]).toEqual([1, 2, 3]);
    expect(readdirSync(join(root, 'files', 's1'))).toEqual(['a.jpg']);
    await expect(disk.put('../escape.jpg', new Uint8Array([9]), 'image/jpeg')).rejects.toThrow();
    await expect(disk.get('../../etc/passwd')).rejects.toThrow();
    expect(readdirSync(root)).toEqual(['files']);
    await disk.delete('s1/a.jpg');
    expect(await disk.get('s1/a.jpg')).toBeNull();
    await expect(disk.delete('s1/a.jpg')).resolves.toBeUndefined();
  });
});
