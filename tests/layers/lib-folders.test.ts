// src/lib is split by folder so that a module's folder says whether it may reach the browser
// (DEVELOPERS.md "Layers"): the engine (allowance/, pricing/), shared/ and server/. The import rules
// (.dependency-cruiser.cjs) are written per folder, so a file left beside them would escape every
// rule of its layer; this fails on one.
import { readdirSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const LIB = resolve(import.meta.dirname, '../../src/lib');
const LAYER_FOLDERS = ['allowance', 'pricing', 'server', 'shared'];

describe('src/lib', () => {
  it('holds only its layer folders: the engine (allowance, pricing), shared and server', () => {
    const entries = readdirSync(LIB, { withFileTypes: true }).map((e) => (e.isDirectory() ? e.name : `${e.name} (a file)`));
    expect(entries.filter((name) => !LAYER_FOLDERS.includes(name))).toEqual([]);
  });

  it('has every layer folder the import rules name', () => {
    const folders = readdirSync(LIB, { withFileTypes: true })
      .filter((e) => e.isDirectory())
      .map((e) => e.name);
    expect(folders.sort()).toEqual(LAYER_FOLDERS);
  });
});
