// The development outbox reads captured mail newest first and only what is addressed to the
// shop's own people.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { listCapturedMail } from '@/services/outbox';

const dir = mkdtempSync(join(tmpdir(), 'cuffwright-outbox-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function save(id: string, to: string[], subject: string) {
  writeFileSync(join(dir, `${id}.json`), JSON.stringify({ id, at: id, from: 'app@cuffwright.test', to, subject, text: '' }));
}

describe('outbox', () => {
  it("lists only the shop's mail, newest first, and ignores half-written files", async () => {
    save('2026-01-01T10-00-00', ['ours@example.com'], 'first');
    save('2026-01-01T11-00-00', ['theirs@example.com'], 'not ours');
    save('2026-01-01T12-00-00', ['Ours@Example.com', 'x@example.com'], 'second');
    writeFileSync(join(dir, '.2026-01-01T13-00-00.tmp'), '{');
    const mails = await listCapturedMail(dir, ['ours@example.com']);
    expect(mails.map((m) => m.subject)).toEqual(['second', 'first']);
  });

  it('is empty when nothing was captured yet', async () => {
    expect(await listCapturedMail(join(dir, 'missing'), ['ours@example.com'])).toEqual([]);
  });
});
