// Scripts and stylesheets under /_astro/ leave the server as built: compressed once at build time
// (brotli and gzip, scripts/precompress.mjs), sent in the encoding the client accepts (identity when
// it accepts neither), with Vary: Accept-Encoding and a year's immutable cache (hashed names).
import { request } from 'node:http';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { beforeAll, describe, expect, inject, it } from 'vitest';

interface Raw {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: Buffer;
}

/** GET without any client-side decoding (fetch would undo the encoding under test). */
function rawGet(path: string, headers: Record<string, string> = {}): Promise<Raw> {
  const url = new URL(path, inject('baseURL'));
  return new Promise((resolve, reject) => {
    const req = request(url, { headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
      res.on('error', reject);
    });
    req.on('error', reject);
    req.end();
  });
}

let script = '';
let style = '';
let identity: Buffer;

beforeAll(async () => {
  // The public calculator page names its island scripts and the stylesheet.
  const page = (await rawGet('/')).body.toString('utf8');
  const scripts = [...page.matchAll(/\/_astro\/[\w.-]+\.js/g)].map((m) => m[0]);
  style = page.match(/\/_astro\/[\w.-]+\.css/)?.[0] ?? '';
  // The largest script, so compression certainly pays.
  const sized = await Promise.all([...new Set(scripts)].map(async (s) => ({ s, n: (await rawGet(s, { 'accept-encoding': 'identity' })).body.length })));
  script = sized.sort((a, b) => b.n - a.n)[0]!.s;
  identity = (await rawGet(script, { 'accept-encoding': 'identity' })).body;
});

describe('a hashed script', () => {
  it('is found on the page and sent whole without compression when none is accepted', async () => {
    expect(script).toMatch(/^\/_astro\//);
    const r = await rawGet(script);
    expect(r.status).toBe(200);
    expect(r.headers['content-encoding']).toBeUndefined();
    expect(r.headers['content-type']).toMatch(/^text\/javascript/);
    expect(r.body.equals(identity)).toBe(true);
    expect(Number(r.headers['content-length'])).toBe(identity.length);
  });

  it('is sent as brotli to a client that accepts br, and decodes to the same bytes', async () => {
    const r = await rawGet(script, { 'accept-encoding': 'gzip, deflate, br' });
    expect(r.status).toBe(200);
    expect(r.headers['content-encoding']).toBe('br');
    expect(r.headers['content-type']).toMatch(/^text\/javascript/);
    expect(r.body.length).toBeLessThan(identity.length);
    expect(brotliDecompressSync(r.body).equals(identity)).toBe(true);
  });

  it('is sent as gzip to a client that accepts gzip only (or refuses br), same bytes decoded', async () => {
    for (const accept of ['gzip', 'br;q=0, gzip;q=0.8']) {
      const r = await rawGet(script, { 'accept-encoding': accept });
      expect(r.headers['content-encoding'], accept).toBe('gzip');
      expect(gunzipSync(r.body).equals(identity)).toBe(true);
    }
  });

  it('says Vary: Accept-Encoding and may be cached for a year, immutable, in every encoding', async () => {
    for (const accept of ['identity', 'gzip', 'br']) {
      const r = await rawGet(script, { 'accept-encoding': accept });
      expect(String(r.headers.vary), accept).toMatch(/accept-encoding/i);
      expect(r.headers['cache-control'], accept).toMatch(/max-age=31536000/);
      expect(r.headers['cache-control'], accept).toMatch(/immutable/);
    }
  });

  it('has a different ETag per encoding, so a cache never answers one with the other', async () => {
    const tags = await Promise.all(['identity', 'gzip', 'br'].map(async (a) => (await rawGet(script, { 'accept-encoding': a })).headers.etag));
    expect(new Set(tags).size).toBe(3);
  });
});

describe('the stylesheet', () => {
  it('is sent as brotli with a text/css type, decoding to the file as sent uncompressed', async () => {
    expect(style).toMatch(/^\/_astro\/.+\.css$/);
    const plain = await rawGet(style, { 'accept-encoding': 'identity' });
    const r = await rawGet(style, { 'accept-encoding': 'br' });
    expect(r.headers['content-encoding']).toBe('br');
    expect(r.headers['content-type']).toMatch(/^text\/css/);
    expect(brotliDecompressSync(r.body).equals(plain.body)).toBe(true);
  });
});

describe('what is not a hashed asset', () => {
  it('a missing /_astro/ script is a 404 without a content-encoding', async () => {
    const r = await rawGet('/_astro/no-such-file.js', { 'accept-encoding': 'br' });
    expect(r.status).toBe(404);
    expect(r.headers['content-encoding']).toBeUndefined();
  });
});
