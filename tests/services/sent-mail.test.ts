// A shop's sent messages come from what was recorded as sent by that shop, never from matching
// addresses the shop typed in; the text is read back from the local capture by Message-ID.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { listSentMail, recordSentMail } = await import('@/services/sent-mail');
const { createCustomer } = await import('@/services/customers');
const { makeShop } = await import('./fixtures');

const dir = mkdtempSync(join(tmpdir(), 'cuffwright-sent-'));
let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Sent Shop A', ['lead', 'counter']);
  b = await makeShop('Sent Shop B', ['lead', 'counter']);
});
afterAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  await handle.close();
});

function capture(name: string, messageId: string, text: string) {
  writeFileSync(join(dir, `${name}.json`), JSON.stringify({ id: name, messageId, to: ['x@example.com'], subject: 's', text }));
}

describe('sent messages', () => {
  it("list only the shop's own messages, newest first, each with its captured text", async () => {
    const shared = 'shared-person@example.com';
    // Both shops know the address; only A writes to it, and a reset goes to it from no shop.
    await createCustomer(b.counter, { name: 'Shared', email: shared });
    await recordSentMail({ shopId: a.shopId, kind: 'invitation' }, { to: shared, subject: 'first', messageId: '<1@test>' });
    await recordSentMail({ shopId: null, kind: 'password-reset' }, { to: shared, subject: 'Reset', messageId: '<2@test>' });
    await new Promise((r) => setTimeout(r, 5));
    await recordSentMail({ shopId: a.shopId, kind: 'ready-notice' }, { to: shared, subject: 'second', messageId: '<3@test>' });
    capture('2026-01-01T10-00-00', '<1@test>', 'join: http://x/invite/1');
    capture('2026-01-01T10-00-01', '<2@test>', 'reset: http://x/reset');
    writeFileSync(join(dir, '.2026-01-01T10-00-02.tmp'), '{');

    const mine = await listSentMail(a.shopId, dir);
    expect(mine.map((m) => [m.subject, m.kind, m.text])).toEqual([
      ['second', 'ready-notice', null],
      ['first', 'invitation', 'join: http://x/invite/1'],
    ]);
    expect(await listSentMail(b.shopId, dir)).toEqual([]);
  });

  it('are empty when the capture folder is missing too', async () => {
    expect(await listSentMail(b.shopId, join(dir, 'missing'))).toEqual([]);
  });
});
