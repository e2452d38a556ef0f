// Fitting photos: only real JPEG/PNG/WebP/HEIC by their bytes, size-limited, names kept only as
// safe text, stored under a random key with a thumbnail, seen only by the garment's shop, audited.
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import zlib from 'node:zlib';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, files, garments, tickets } = await import('@/db/schema');
const { useStorage } = await import('@/lib/server/storage');
const { DiskStorage } = await import('@/lib/server/storage/disk-storage');
const svc = await import('@/services/photos');
const { makeShop } = await import('./fixtures');
const { gpsExif, sampleHeif, SAMPLE_EXIF_MAKE, SAMPLE_PICTURE, SAMPLE_XMP_MARK } = await import('../lib/storage/heif-sample');

const root = mkdtempSync(join(tmpdir(), 'cuffwright-photos-'));
const storageRoot = join(root, 'files');
useStorage(new DiskStorage(storageRoot));
const MB = 1024 * 1024;

let a: Shop;
let b: Shop;
let garmentA = '';
let garmentB = '';
let jpeg: Uint8Array;

async function garmentOf(shopId: string): Promise<string> {
  const [t] = await db
    .insert(tickets)
    .values({ shopId, number: Math.floor(Math.random() * 1e6) })
    .returning();
  const [g] = await db.insert(garments).values({ shopId, ticketId: t!.id, description: 'Grey flannel trousers' }).returning();
  return g!.id;
}

async function image(format: 'jpeg' | 'png' | 'webp', width = 1200, height = 900): Promise<Uint8Array> {
  const img = sharp({ create: { width, height, channels: 3, background: { r: 90, g: 100, b: 120 } } });
  return new Uint8Array(await img[format]().toBuffer());
}

/** True when the EXIF block (as sharp's metadata() gives it) has IFD0's pointer to a GPS IFD (tag 0x8825). */
function hasGpsIfd(exif: Buffer | undefined): boolean {
  if (!exif) return false;
  const tiff = exif.subarray(exif.subarray(0, 6).toString('latin1') === 'Exif\0\0' ? 6 : 0);
  const le = tiff.subarray(0, 2).toString('latin1') === 'II';
  const u16 = (o: number) => (le ? tiff.readUInt16LE(o) : tiff.readUInt16BE(o));
  const u32 = (o: number) => (le ? tiff.readUInt32LE(o) : tiff.readUInt32BE(o));
  const ifd0 = u32(4);
  for (let i = 0; i < u16(ifd0); i++) if (u16(ifd0 + 2 + i * 12) === 0x8825) return true;
  return false;
}

beforeAll(async () => {
  a = await makeShop('Photo Shop A');
  b = await makeShop('Photo Shop B');
  garmentA = await garmentOf(a.shopId);
  garmentB = await garmentOf(b.shopId);
  jpeg = await image('jpeg');
});
afterAll(async () => {
  await handle.close();
  rmSync(root, { recursive: true, force: true });
});

describe('fitting photos', () => {
  it('take JPEG, PNG and WebP, each under a random key in the shop folder, with a WebP thumbnail', async () => {
    const added = await svc.addPhotos(
      a.tailor,
      garmentA,
      [
        { name: 'pinned-left.jpg', bytes: jpeg },
        { name: 'pinned right.png', bytes: await image('png') },
        { name: 'back.webp', bytes: await image('webp') },
      ],
      10 * MB,
    );
    expect(added.map((p) => [p.name, p.mimeType, p.hasThumb])).toEqual([
      ['pinned-left.jpg', 'image/jpeg', true],
      ['pinned right.png', 'image/png', true],
      ['back.webp', 'image/webp', true],
    ]);
    const stored = readdirSync(join(storageRoot, a.shopId)).sort();
    expect(stored).toHaveLength(6);
    for (const name of stored) expect(name).toMatch(/^[0-9a-f-]{36}(\.(jpg|png|webp)|-thumb\.webp)$/);
    const thumb = await svc.readPhoto(a.apprentice, added[0]!.id, 'thumb');
    expect(thumb.mimeType).toBe('image/webp');
    const meta = await sharp(thumb.bytes).metadata();
    expect(Math.max(meta.width!, meta.height!)).toBe(480);
    const full = await svc.readPhoto(a.counter, added[0]!.id);
    expect(full.mimeType).toBe('image/jpeg');
    expect(await sharp(full.bytes).metadata()).toMatchObject({ format: 'jpeg', width: 1200, height: 900 });
    expect((await svc.listPhotos(a.lead, garmentA)).map((p) => p.id)).toEqual(added.map((p) => p.id));
  });

  it('take a HEIC from a phone by its ftyp brand, without its EXIF (GPS) and XMP, and with a placeholder thumbnail', async () => {
    const heic = await sampleHeif();
    const [p] = await svc.addPhotos(a.tailor, garmentA, [{ name: 'IMG_0042.HEIC', bytes: new Uint8Array(heic) }], 10 * MB);
    expect(p).toMatchObject({ mimeType: 'image/heic', hasThumb: false, bytes: heic.byteLength });
    // This sharp cannot decode HEIC: the metadata items are zeroed in place, the picture kept as it came.
    const kept = Buffer.from((await svc.readPhoto(a.tailor, p!.id)).bytes);
    expect(kept.length).toBe(heic.length);
    expect(kept.includes(SAMPLE_PICTURE)).toBe(true);
    expect(kept.includes((await gpsExif()).subarray(6))).toBe(false);
    expect(kept.includes(Buffer.from(SAMPLE_EXIF_MAKE))).toBe(false);
    expect(kept.includes(Buffer.from(SAMPLE_XMP_MARK))).toBe(false);
    const thumb = await svc.readPhoto(a.tailor, p!.id, 'thumb');
    expect(thumb.mimeType).toBe('image/svg+xml');
    expect(await sharp(thumb.bytes).metadata()).toMatchObject({ format: 'svg', width: 480, height: 360 });
    expect(new TextDecoder().decode(thumb.bytes)).toContain('open to view');
    expect(readdirSync(join(storageRoot, a.shopId)).filter((n) => n.startsWith(p!.id))).toEqual([`${p!.id}.heic`]);
  });

  it('refuse a HEIC whose boxes cannot be read, as its location could not be removed', async () => {
    const broken = new Uint8Array([0, 0, 0, 24, ...Buffer.from('ftypheic'), 0, 0, 0, 0, ...Buffer.from('mif1heic'), ...new Array(64).fill(7)]);
    await expect(svc.addPhotos(a.tailor, garmentA, [{ name: 'cut-short.heic', bytes: broken }], 10 * MB)).rejects.toMatchObject({
      status: 415,
      message: expect.stringMatching(/location could not be removed/),
    });
  });

  it('refuse a file that only starts like a HEIC: a HEIC header then HTML, or nothing', async () => {
    const header = new Uint8Array([0, 0, 0, 24, ...Buffer.from('ftypheic'), 0, 0, 0, 0, ...Buffer.from('mif1heic')]);
    for (const tail of [Buffer.from('<html><body><script>alert(document.cookie)</script></body></html>'), Buffer.alloc(0)]) {
      const bytes = new Uint8Array([...header, ...tail]);
      await expect(svc.addPhotos(a.tailor, garmentA, [{ name: 'IMG_1.HEIC', bytes }], 10 * MB)).rejects.toMatchObject({ status: 415 });
    }
  });

  it('refuse a picture of more pixels than MAX_PIXELS from its header, before decoding it (PNG and HEIC)', async () => {
    // A PNG header declaring 16,000 x 16,000 pixels; the pixels themselves are never read.
    const chunk = (type: string, data: Buffer) => {
      const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
      const len = Buffer.alloc(4);
      len.writeUInt32BE(data.length);
      const crc = Buffer.alloc(4);
      crc.writeUInt32BE(zlib.crc32(body));
      return Buffer.concat([len, body, crc]);
    };
    const ihdr = Buffer.alloc(13);
    ihdr.writeUInt32BE(16000, 0);
    ihdr.writeUInt32BE(16000, 4);
    ihdr.set([8, 2, 0, 0, 0], 8);
    const png = Buffer.concat([
      Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
      chunk('IHDR', ihdr),
      chunk('IDAT', zlib.deflateSync(Buffer.alloc(1000))),
      chunk('IEND', Buffer.alloc(0)),
    ]);
    expect(await sharp(png).metadata()).toMatchObject({ width: 16000, height: 16000 });
    const heic = await sampleHeif({ width: 16000, height: 16000 });
    for (const [name, bytes] of [
      ['huge.png', png],
      ['huge.heic', heic],
    ] as const) {
      await expect(svc.addPhotos(a.tailor, garmentA, [{ name, bytes: new Uint8Array(bytes) }], 10 * MB), name).rejects.toMatchObject({
        status: 413,
        message: expect.stringMatching(/16000 × 16000 pixels/),
      });
    }
    // Just under the limit is still a photo (a 48 MP phone camera's, 8000 x 6000).
    await expect(
      svc.checkPicture(new Uint8Array(await sampleHeif({ width: 8000, height: 6000 })), { mime: 'image/heic', ext: 'heic' }, 'big.heic'),
    ).resolves.toBeUndefined();
    expect(svc.MAX_PIXELS).toBeGreaterThanOrEqual(48_000_000);
  });

  it('keep no EXIF, GPS or XMP in the stored photo, turned upright by its EXIF orientation first', async () => {
    // 1200 wide × 900 high as the sensor saw it, orientation 6: shown turned a quarter, 900 × 1200.
    const tagged = await sharp({ create: { width: 1200, height: 900, channels: 3, background: { r: 90, g: 100, b: 120 } } })
      .jpeg()
      .withMetadata({ orientation: 6 })
      .withExif({
        IFD0: { Make: 'Invented Camera Co' },
        IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
      })
      .withXmp(
        '<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#"><rdf:Description xmlns:exif="http://ns.adobe.com/exif/1.0/" exif:GPSLatitude="51,30.0N"/></rdf:RDF></x:xmpmeta>',
      )
      .toBuffer();
    const sent = await sharp(tagged).metadata();
    expect(hasGpsIfd(sent.exif)).toBe(true);
    expect(sent).toMatchObject({ orientation: 6, width: 1200, height: 900 });
    expect(sent.xmp).toBeDefined();

    const [p] = await svc.addPhotos(a.tailor, garmentA, [{ name: 'with-location.jpg', bytes: new Uint8Array(tagged) }], 10 * MB);
    const [row] = await db.select().from(files).where(eq(files.id, p!.id));
    const onDisk = readFileSync(join(storageRoot, row!.path));
    const kept = await sharp(onDisk).metadata();
    expect(kept.exif).toBeUndefined();
    expect(kept.xmp).toBeUndefined();
    expect(kept.iptc).toBeUndefined();
    expect(kept.orientation).toBeUndefined();
    expect([kept.format, kept.width, kept.height]).toEqual(['jpeg', 900, 1200]);
    expect(onDisk.includes(Buffer.from('Invented Camera Co'))).toBe(false);
    expect(row!.bytes).toBe(onDisk.byteLength);
    const thumb = await sharp(readFileSync(join(storageRoot, row!.thumbPath!))).metadata();
    expect([thumb.width, thumb.height, thumb.exif]).toEqual([360, 480, undefined]);
  });

  it('refuse what is not a photo by its bytes, whatever the name says: SVG, GIF, text, a broken JPEG', async () => {
    const cases: [string, Uint8Array][] = [
      ['drawing.svg', new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>')],
      ['looks-like.jpg', new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg"/>')],
      ['anim.gif', new TextEncoder().encode('GIF89a\x01\x00\x01\x00')],
      ['notes.png', new TextEncoder().encode('just text')],
      ['broken.jpg', new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 4, 5, 6, 7, 8])],
    ];
    for (const [name, bytes] of cases) {
      await expect(svc.addPhotos(a.tailor, garmentA, [{ name, bytes }], 10 * MB), name).rejects.toMatchObject({ status: 415 });
    }
  });

  it('refuse a photo over the size limit, and store none of the batch', async () => {
    const before = readdirSync(join(storageRoot, a.shopId)).length;
    const uploads = [
      { name: 'small.jpg', bytes: await image('jpeg', 40, 30) },
      { name: 'big.jpg', bytes: jpeg },
    ];
    await expect(svc.addPhotos(a.tailor, garmentA, uploads, jpeg.byteLength - 1)).rejects.toMatchObject({ status: 413 });
    expect(readdirSync(join(storageRoot, a.shopId))).toHaveLength(before);
  });

  it('refuse names that point at folders, and keep other names only as safe text', async () => {
    for (const name of ['../../etc/passwd.jpg', '..\\..\\evil.jpg', '/tmp/x.jpg', '..']) {
      await expect(svc.addPhotos(a.tailor, garmentA, [{ name, bytes: jpeg }], 10 * MB), name).rejects.toMatchObject({ status: 422 });
    }
    expect(readdirSync(root).sort()).toEqual(['files']);
    const [p] = await svc.addPhotos(a.tailor, garmentA, [{ name: 'fit\u0000 <left> "pin";.jpg', bytes: jpeg }], 10 * MB);
    expect(p!.name).toBe('fit _left_ _pin__.jpg');
    const [row] = await db.select().from(files).where(eq(files.id, p!.id));
    expect(row!.path).toBe(`${a.shopId}/${p!.id}.jpg`);
  });

  it("answer 404 for another shop's garment and photo, and keep the photo", async () => {
    const [theirs] = await svc.addPhotos(b.tailor, garmentB, [{ name: 'b.jpg', bytes: jpeg }], 10 * MB);
    await expect(svc.readPhoto(a.lead, theirs!.id)).rejects.toMatchObject({ status: 404 });
    await expect(svc.readPhoto(a.lead, theirs!.id, 'thumb')).rejects.toMatchObject({ status: 404 });
    await expect(svc.deletePhoto(a.lead, theirs!.id)).rejects.toMatchObject({ status: 404 });
    await expect(svc.listPhotos(a.lead, garmentB)).rejects.toMatchObject({ status: 404 });
    await expect(svc.addPhotos(a.lead, garmentB, [{ name: 'x.jpg', bytes: jpeg }], 10 * MB)).rejects.toMatchObject({ status: 404 });
    await expect(svc.readPhoto(a.lead, '../../etc/passwd')).rejects.toMatchObject({ status: 404 });
    expect((await svc.readPhoto(b.apprentice, theirs!.id)).bytes.byteLength).toBe(theirs!.bytes);
  });

  it("keep an apprentice to the queue's rule: no photos of a garment given to someone else", async () => {
    const tailorsGarment = await garmentOf(a.shopId);
    await db.update(garments).set({ assigneeId: a.tailor.userId }).where(eq(garments.id, tailorsGarment));
    const [p] = await svc.addPhotos(a.tailor, tailorsGarment, [{ name: 'tailor.jpg', bytes: jpeg }], 10 * MB);
    await expect(svc.listPhotos(a.apprentice, tailorsGarment)).rejects.toMatchObject({ status: 404 });
    await expect(svc.readPhoto(a.apprentice, p!.id)).rejects.toMatchObject({ status: 404 });
    expect((await svc.readPhoto(a.counter, p!.id)).mimeType).toBe('image/jpeg');
    await db.update(garments).set({ assigneeId: a.apprentice.userId }).where(eq(garments.id, tailorsGarment));
    expect((await svc.listPhotos(a.apprentice, tailorsGarment)).map((x) => x.id)).toEqual([p!.id]);
  });

  it('keep no EXIF or XMP in stored PNG and WebP photos either', async () => {
    for (const format of ['png', 'webp'] as const) {
      const tagged = await sharp({ create: { width: 300, height: 200, channels: 3, background: { r: 90, g: 100, b: 120 } } })
        [format]()
        .withExif({ IFD0: { Make: 'Invented Camera Co' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1' } })
        .withXmp('<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#"/></x:xmpmeta>')
        .toBuffer();
      const sent = await sharp(tagged).metadata();
      expect([hasGpsIfd(sent.exif), sent.xmp !== undefined], format).toEqual([true, true]);
      const [p] = await svc.addPhotos(a.tailor, garmentA, [{ name: `tagged.${format}`, bytes: new Uint8Array(tagged) }], 10 * MB);
      const kept = await sharp((await svc.readPhoto(a.tailor, p!.id)).bytes).metadata();
      expect([kept.format, kept.exif, kept.xmp, kept.width], format).toEqual([format, undefined, undefined, 300]);
    }
  });

  it('delete a photo with its thumbnail; adding and deleting are audited', async () => {
    const [p] = await svc.addPhotos(a.lead, garmentA, [{ name: 'to-remove.jpg', bytes: jpeg }], 10 * MB);
    expect(readdirSync(join(storageRoot, a.shopId)).filter((n) => n.startsWith(p!.id))).toHaveLength(2);
    expect(await svc.deletePhoto(a.tailor, p!.id)).toEqual({ id: p!.id, deleted: true });
    expect(readdirSync(join(storageRoot, a.shopId)).filter((n) => n.startsWith(p!.id))).toEqual([]);
    await expect(svc.readPhoto(a.lead, p!.id)).rejects.toMatchObject({ status: 404 });
    const events = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.shopId, a.shopId), eq(auditEvents.subject, p!.id)));
    expect(events.map((e) => e.action)).toEqual(['photo.added', 'photo.deleted']);
    expect(events[0]!.detail).toMatchObject({ garmentId: garmentA, name: 'to-remove.jpg', type: 'image/jpeg' });
  });

  it('delete the row even when the storage will not remove the file: logged, and the photo stays gone', async () => {
    const [p] = await svc.addPhotos(a.lead, garmentA, [{ name: 'stuck.jpg', bytes: jpeg }], 10 * MB);
    const disk = new DiskStorage(storageRoot);
    const refused: string[] = [];
    useStorage({
      put: disk.put.bind(disk),
      get: disk.get.bind(disk),
      delete: async (key) => {
        refused.push(key);
        throw new Error('disk is read-only');
      },
    });
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
    let warnings: unknown[][] = [];
    try {
      expect(await svc.deletePhoto(a.lead, p!.id)).toEqual({ id: p!.id, deleted: true });
      warnings = [...warn.mock.calls];
    } finally {
      useStorage(disk);
      warn.mockRestore();
    }
    expect(refused).toEqual([`${a.shopId}/${p!.id}.jpg`, `${a.shopId}/${p!.id}-thumb.webp`]);
    expect(warnings.map((w) => String(w[0]))).toEqual([
      `Photo ${p!.id}: could not remove ${a.shopId}/${p!.id}.jpg from the storage: disk is read-only`,
      `Photo ${p!.id}: could not remove ${a.shopId}/${p!.id}-thumb.webp from the storage: disk is read-only`,
    ]);
    expect(await db.select().from(files).where(eq(files.id, p!.id))).toEqual([]);
    await expect(svc.readPhoto(a.lead, p!.id)).rejects.toMatchObject({ status: 404 });
    await expect(svc.deletePhoto(a.lead, p!.id)).rejects.toMatchObject({ status: 404 });
  });
});
