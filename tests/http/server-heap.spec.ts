// The server runs with the main-thread heap npm start gives it (scripts/env.mjs, serverNodeFlags):
// left to V8's defaults its heap held a burst of requests' garbage to 130-155 MB and the server
// peaked over issue 12's 600 MB while a batch of 500 sheets printed. The browser and HTTP tests'
// server is started the same way, so every story runs against the cap.
import { readFileSync } from 'node:fs';
import { describe, expect, inject, it } from 'vitest';
import { serverNodeFlags } from '../../scripts/env.mjs';

describe("the server's heap", () => {
  it('is capped at SERVER_HEAP_MB, 192 MB unless set, on the command line of the server the tests run', () => {
    expect(serverNodeFlags({ SERVER_HEAP_MB: 192 } as never)).toEqual(['--max-old-space-size=192']);
    expect(serverNodeFlags({ SERVER_HEAP_MB: 512 } as never)).toEqual(['--max-old-space-size=512']);
    const expected = serverNodeFlags();
    expect(expected[0]).toMatch(/^--max-old-space-size=\d+$/);
    const pid = inject('serverPid');
    expect(pid).toBeGreaterThan(0);
    const argv = readFileSync(`/proc/${pid}/cmdline`, 'utf8').split('\0');
    expect(argv).toContain(expected[0]);
    expect(argv.findIndex((a) => a.endsWith('server/entry.mjs'))).toBeGreaterThan(argv.indexOf(expected[0]!));
  });
});
