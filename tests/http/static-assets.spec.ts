// Scripts and stylesheets under /_astro/ leave the server as built: compressed once at build time
// (brotli and gzip, scripts/precompress.mjs), sent in the encoding the client accepts (identity when
// it accepts neither), with Vary: Accept-Encoding and a year's immutable cache (hashed names).
import { rmSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { join } from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { beforeAll, describe, expect, inject, it } from 'vitest';

interface Raw {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: Buffer;
}

/** GET without any client-side decoding (fetch would undo the encoding under test), the path sent as written. */
function rawGet(path: string, headers: Record<string, string> = {}): Promise<Raw> {
  const url = new URL(inject('baseURL'));
  return new Promise((resolve, reject) => {
    const req = request({ hostname: url.hostname, port: url.port, path, headers }, (res) => {
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

describe('the files the server sends as they are', () => {
  const dist = process.env.TEST_DIST_DIR || '.test-dist';
  const added = `added-after-start-${process.pid}.txt`;

  it('are those the build wrote, known when it started: an API call or a page never waits on a file look-up', async () => {
    // A file put in the client folder after the start is not among them: the app answers its path.
    writeFileSync(join(dist, 'client', added), 'not built');
    try {
      const r = await rawGet(`/${added}`);
      expect(r.status).not.toBe(200);
      expect(r.body.toString('utf8')).not.toContain('not built');
    } finally {
      rmSync(join(dist, 'client', added), { force: true });
    }
    // Built files are still found under any spelling that names them.
    expect((await rawGet(script.replace('/_astro/', '/_astro/./'))).status).toBe(200);
    expect((await rawGet(script.replace('/_astro/', '/%5Fastro/'))).status).toBe(200);
    expect((await rawGet('/favicon.svg')).status).toBe(200);
  });

  it('leave a malformed or escaping path to the same answers as before', async () => {
    expect((await rawGet('/%E0%A4%A')).status).toBeLessThan(500);
    const escaping = await rawGet('/_astro/../../server/entry.mjs');
    expect(escaping.status).not.toBe(200);
    expect(escaping.body.toString('utf8')).not.toContain('createStaticHandler');
  });
});
