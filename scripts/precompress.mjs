// An Astro integration: after `astro build`, every hashed script and stylesheet in the client's
// /_astro/ folder gets a brotli (.br) and a gzip (.gz) copy beside it, compressed once at their
// smallest settings, so the server sends them compressed without compressing per request
// (patches/@astrojs+node+*.patch serves them by Accept-Encoding).
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

/** Extensions worth compressing (fonts and images are compressed already). */
export const COMPRESSED_TYPES = /\.(js|mjs|css|svg|json)$/;

/** Writes name.br and name.gz beside each compressible file in dir, unless no smaller; returns bytes before and after brotli. */
export function precompressDir(dir) {
  let before = 0;
  let after = 0;
  for (const name of readdirSync(dir)) {
    if (!COMPRESSED_TYPES.test(name)) continue;
    const path = join(dir, name);
    const data = readFileSync(path);
    const br = brotliCompressSync(data, {
      params: { [constants.BROTLI_PARAM_QUALITY]: constants.BROTLI_MAX_QUALITY, [constants.BROTLI_PARAM_SIZE_HINT]: data.length },
    });
    const gz = gzipSync(data, { level: constants.Z_BEST_COMPRESSION });
    // A copy no smaller than the file would only cost the client a decode.
    if (br.length < data.length) writeFileSync(`${path}.br`, br);
    if (gz.length < data.length) writeFileSync(`${path}.gz`, gz);
    before += data.length;
    after += Math.min(br.length, data.length);
  }
  return { before, after };
}

/** The integration: runs precompressDir on the client's assets folder when a build is done. */
export function precompress() {
  let assetsDir = '';
  return {
    name: 'cuffwright:precompress',
    hooks: {
      'astro:config:done': ({ config }) => {
        assetsDir = join(fileURLToPath(config.build.client), config.build.assets);
      },
      'astro:build:done': ({ logger }) => {
        const { before, after } = precompressDir(assetsDir);
        logger.info(`${Math.round(before / 1024)} KiB of scripts and styles precompressed (brotli ${Math.round(after / 1024)} KiB)`);
      },
    },
  };
}
