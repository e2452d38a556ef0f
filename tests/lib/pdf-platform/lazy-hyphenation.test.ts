// react-pdf's text layout imports the English hyphenation patterns and, as published, builds their
// trie at import (about 9 MB of heap and 50 ms in every thread that draws a PDF), although our
// sheets register their own word callback and never ask for it. Our patch of @react-pdf/hyphenate
// (patches/@react-pdf+hyphenate+*.patch) builds it at the first word hyphenated: importing costs
// next to nothing, and the words split as the eager hyphenator splits them.
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import createHyphenator from '@react-pdf/hyphenate';
import { hyphenate, patterns, syllables } from '@react-pdf/hyphenate/en-us';

// The heap a fresh Node gains by importing a module, after full collections either side.
function heapGainMb(specifier: string): number {
  const script = `
    const v8 = await import('node:v8');
    const used = () => { gc(); gc(); return v8.getHeapStatistics().used_heap_size; };
    const before = used();
    globalThis.kept = await import(${JSON.stringify(specifier)});
    console.log((used() - before) / 1048576);`;
  const r = spawnSync(process.execPath, ['--expose-gc', '--input-type=module', '-e', script], { encoding: 'utf8' });
  expect(r.status, r.stderr).toBe(0);
  return Number(r.stdout.trim());
}

describe('the English hyphenation patterns', () => {
  it('are not built into a trie on import', () => {
    // Measured 2026-12-05: 8.9 MB as published, 0.1 MB with the patch.
    expect(heapGainMb('@react-pdf/hyphenate/en-us')).toBeLessThan(2);
  });

  it('split words as the eager hyphenator does, once asked', () => {
    const eager = createHyphenator(patterns);
    for (const word of ['alteration', 'trousers', 'hemming', 'inseam', 'Measurement', 'a', 'tapered', 'hyphenation']) {
      expect(syllables(word)).toEqual(eager.syllables(word));
      expect(hyphenate(word)).toEqual(eager.hyphenate(word));
    }
    // A word the patterns do split, so the comparison above is not of unsplit words alone.
    expect(syllables('hyphenation').length).toBeGreaterThan(1);
  });
});
