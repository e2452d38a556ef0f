// Fitting photo uploads over HTTP against the built server: real images in and out with safe
// headers; wrong types, oversize files, folder-like names and another shop's photos all refused.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import sharp from 'sharp';
import { beforeAll, describe, expect, it, inject } from 'vitest';
import { call, DEMO, newShop, signIn } from './client';
import { sampleHeif } from '../lib/storage/heif-sample';
import { sampleJpeg, someGarment, upload } from './photo-upload';

let lead = '';
let tailor = '';
let counter = '';
let garment = '';
let other = { shopId: '', cookie: '' };
let jpeg: Uint8Array;

beforeAll(async () => {
  lead = await signIn(DEMO.lead);
  tailor = await signIn(DEMO.tailor);
  counter = await signIn(DEMO.counter);
  garment = await someGarment(lead);
  other = await newShop('Far Street Alterations');
  jpeg = await sampleJpeg();
});

/** Every file the storage holds, relative to DATA_DIR. */
function storedFiles(): string[] {
  const root = join(inject('dataDir'), 'files');
  try {
    return readdirSync(root, { recursive: true, withFileTypes: true })
      .filter((e) => e.isFile())
      .map((e) => join(e.parentPath, e.name).slice(inject('dataDir').length + 1));
  } catch {
    return [];
  }
}

describe('fitting photos over HTTP', () => {
  it('takes several photos at once and serves them with their type, privately, unsniffed', async () => {
    const r = await upload(tailor, garment, [
      { name: 'left-leg.jpg', bytes: jpeg },
      { name: 'right-leg.jpg', bytes: await sampleJpeg(600, 800) },
    ]);
    expect(r.status).toBe(201);
    expect(r.body.map((p: { name: string }) => p.name)).toEqual(['left-leg.jpg', 'right-leg.jpg']);
    const list = await call('GET', `/api/garments/${garment}/photos`, { cookie: counter });
    expect(list.body.photos.map((p: { id: string }) => p.id)).toEqual(expect.arrayContaining(r.body.map((p: { id: string }) => p.id)));

    const base = inject('baseURL');
    const full = await fetch(`${base}${r.body[0].url}`, { headers: { cookie: counter } });
    expect(full.status).toBe(200);
    expect(full.headers.get('content-type')).toBe('image/jpeg');
    expect(full.headers.get('cache-control')).toMatch(/^private/);
    expect(full.headers.get('x-content-type-options')).toBe('nosniff');
    // Kept re-encoded without its metadata (tests/services/photos.test.ts checks EXIF and GPS): same picture size.
    expect(await sharp(Buffer.from(await full.arrayBuffer())).metadata()).toMatchObject({ format: 'jpeg', width: 800, height: 600 });
    const thumb = await fetch(`${base}${r.body[0].thumbUrl}`, { headers: { cookie: counter } });
    expect(thumb.headers.get('content-type')).toBe('image/webp');
    expect((await thumb.arrayBuffer()).byteLength).toBeLessThan(jpeg.byteLength);
  });

  it('refuses SVG, HTML and text, whatever their name or declared type says (415)', async () => {
    const svg = new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"/>');
    for (const [name, type] of [
      ['mark.svg', 'image/svg+xml'],
      ['mark.jpg', 'image/jpeg'],
      ['page.html', 'text/html'],
    ] as const) {
      const r = await upload(tailor, garment, [{ name, bytes: svg, type }]);
      expect(r.status, name).toBe(415);
      expect(r.body.issues.photos).toMatch(/not a photo we take/);
    }
  });

  it('refuses a photo over 10 MB (413) and keeps none of its batch', async () => {
    const before = storedFiles().length;
    const big = new Uint8Array(10 * 1024 * 1024 + 1);
    big.set(jpeg.subarray(0, 3));
    const r = await upload(tailor, garment, [
      { name: 'fine.jpg', bytes: jpeg },
      { name: 'huge.jpg', bytes: big },
    ]);
    expect(r.status).toBe(413);
    expect(storedFiles().length).toBe(before);
  });

  it('refuses names that point at folders (422) and writes nothing outside the storage', async () => {
    const before = storedFiles().length;
    for (const name of ['../../../escape.jpg', '..\\..\\escape.jpg', '/etc/escape.jpg']) {
      const r = await upload(tailor, garment, [{ name, bytes: jpeg }]);
      expect(r.status, name).toBe(422);
    }
    expect(storedFiles().length).toBe(before);
    for (const f of storedFiles()) expect(f).toMatch(/^files\/[\w-]+\/[0-9a-f-]{36}(-thumb)?\.(jpg|png|webp|heic)$/);
    expect(readdirSync(join(inject('dataDir'), '..')).some((n) => n.startsWith('escape'))).toBe(false);
  });

  it("answers 404 for another shop's photos and garments, and for ids that are paths", async () => {
    const mine = await upload(lead, garment, [{ name: 'a.jpg', bytes: jpeg }]);
    const id = mine.body[0].id;
    for (const path of [`/api/photos/${id}`, `/api/photos/${id}/thumb`, `/api/garments/${garment}/photos`]) {
      expect((await call('GET', path, { cookie: other.cookie })).status, path).toBe(404);
    }
    expect((await call('DELETE', `/api/photos/${id}`, { cookie: other.cookie })).status).toBe(404);
    expect((await upload(other.cookie, garment, [{ name: 'b.jpg', bytes: jpeg }])).status).toBe(404);
    expect((await call('GET', '/api/photos/..%2F..%2Fpglite', { cookie: lead })).status).toBe(404);
    expect((await call('GET', `/api/photos/${id}`)).status).toBe(401);
    expect((await call('GET', `/api/photos/${id}`, { cookie: lead })).status).toBe(200);
  });

  it("answers a HEIC photo's thumbnail with the placeholder tile, an image, not an error or a broken picture", async () => {
    const r = await upload(tailor, garment, [{ name: 'IMG_0107.HEIC', bytes: new Uint8Array(await sampleHeif()), type: 'image/heic' }]);
    expect(r.status).toBe(201);
    expect(r.body[0].hasThumb).toBe(false);
    const thumb = await fetch(`${inject('baseURL')}${r.body[0].thumbUrl}`, { headers: { cookie: counter } });
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get('content-type')).toBe('image/svg+xml');
    expect(thumb.headers.get('content-security-policy')).toContain('sandbox');
    const tile = Buffer.from(await thumb.arrayBuffer());
    expect(await sharp(tile).metadata()).toMatchObject({ format: 'svg', width: 480, height: 360 });
    expect(tile.toString()).toContain('open to view');
    expect(tile.toString()).not.toMatch(/<script|href=/);
  });

  it('removes the photo and its thumbnail from the disk when the photo is deleted', async () => {
    const r = await upload(tailor, garment, [{ name: 'to-go.jpg', bytes: jpeg }]);
    const id: string = r.body[0].id;
    const mine = () => storedFiles().filter((f) => f.includes(id));
    expect(mine()).toHaveLength(2);
    const gone = await call('DELETE', `/api/photos/${id}`, { cookie: tailor });
    expect(gone.status).toBe(200);
    expect(mine()).toEqual([]);
    expect((await call('GET', `/api/photos/${id}`, { cookie: tailor })).status).toBe(404);
  });

  it('refuses an upload with no photo (422) and one that is not a form (400)', async () => {
    expect((await upload(tailor, garment, [])).status).toBe(422);
    expect((await call('POST', `/api/garments/${garment}/photos`, { cookie: tailor, body: { photos: 'x' } })).status).toBe(400);
  });
});
