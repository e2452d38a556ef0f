// The build's catalog plugin must find the catalog where it lives: a path it misses ships the
// messages unparsed, and the browser's formatter (built without a parser) shows no language.
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { icuCatalog } from '../../scripts/vite-icu-catalog.mjs';

const folder = fileURLToPath(new URL('../../src/lib/shared/i18n/messages/', import.meta.url));
const languages = readdirSync(folder).filter((f) => f.endsWith('.json'));

describe('the build plugin for the message catalog', () => {
  it('finds every language file of the catalog', () => {
    expect(languages.length).toBeGreaterThanOrEqual(2);
  });

  it.each(languages)('parses %s into syntax trees, one per message', (file) => {
    const path = `${folder}${file}`;
    const source = readFileSync(path, 'utf8');
    const out = icuCatalog().transform(source, path);
    expect(out, `${file} was not transformed`).not.toBeNull();
    const trees = JSON.parse(out!.code) as Record<string, unknown>;
    expect(Object.keys(trees)).toEqual(Object.keys(JSON.parse(source)));
    for (const tree of Object.values(trees)) expect(Array.isArray(tree)).toBe(true);
  });
});
