// The Storage contract, the same cases on the disk and on an S3-compatible store (the local s3rver
// fake, spoken to through the AWS SDK): what one put, get returns byte for byte; a missing key is
// null; delete removes and tolerates a missing key; keys that could leave the root are refused.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DiskStorage } from '@/lib/server/storage/disk-storage';
import { S3Storage, s3FromSettings } from '@/lib/server/storage/s3-storage';
import type { Storage } from '@/lib/server/storage/storage';
import { startS3Fake } from '../../../scripts/s3-fake.mjs';

const dirs: string[] = [];
const tmp = (name: string) => {
  const d = mkdtempSync(join(tmpdir(), name));
  dirs.push(d);
  return d;
};
let fake: { env: Record<string, string>; close: () => Promise<void> };
const stores: Record<string, () => Storage> = {};

beforeAll(async () => {
  fake = await startS3Fake({ dir: tmp('cw-s3-') });
  const s3 = s3FromSettings({ ...fake.env, STORAGE: 's3' });
  if (typeof s3 === 'string') throw new Error(s3);
  stores.s3 = () => s3;
  stores.disk = () => new DiskStorage(tmp('cw-disk-'));
});
afterAll(async () => {
  await fake?.close();
  for (const d of dirs) rmSync(d, { recursive: true, force: true });
});

describe.each(['disk', 's3'])('%s storage', (kind) => {
  const store = () => stores[kind]!();

  it('gives back what was put, byte for byte, and the last put wins', async () => {
    const s = store();
    const bytes = new Uint8Array(70_000).map((_, i) => (i * 31) & 255);
    await s.put('shop1/photo-a.jpg', bytes, 'image/jpeg');
    expect(await s.get('shop1/photo-a.jpg')).toEqual(bytes);
    await s.put('shop1/photo-a.jpg', new Uint8Array([7]), 'image/jpeg');
    expect(await s.get('shop1/photo-a.jpg')).toEqual(new Uint8Array([7]));
  });

  it('answers null for a key never put, and delete removes (twice is not an error)', async () => {
    const s = store();
    expect(await s.get('shop1/never.jpg')).toBeNull();
    await s.put('shop1/gone.png', new Uint8Array([1, 2]), 'image/png');
    await s.delete('shop1/gone.png');
    expect(await s.get('shop1/gone.png')).toBeNull();
    await expect(s.delete('shop1/gone.png')).resolves.toBeUndefined();
  });

  it('refuses keys that could reach outside its root or bucket prefix', async () => {
    const s = store();
    for (const key of ['../x.jpg', '/etc/passwd.txt', 'a/../../b.jpg', 'a//b.jpg', 'a\\b.jpg']) {
      await expect(s.put(key, new Uint8Array([1]), 'image/jpeg')).rejects.toThrow(/Refusing storage key/);
      await expect(s.get(key)).rejects.toThrow(/Refusing storage key/);
    }
  });
});

describe('s3 settings', () => {
  it('name what is missing in one line', () => {
    expect(s3FromSettings({ STORAGE: 's3' })).toMatch(/S3_BUCKET/);
    expect(s3FromSettings({ STORAGE: 's3', S3_BUCKET: 'b', S3_ACCESS_KEY_ID: 'k' })).toMatch(/S3_SECRET_ACCESS_KEY/);
    expect(s3FromSettings({ STORAGE: 's3', S3_BUCKET: 'b' })).toBeInstanceOf(S3Storage);
  });
});
