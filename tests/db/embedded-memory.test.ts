// The embedded database's page cache is kept small (src/db/open.ts): PGlite holds it in memory
// that is resident from the start, and PostgreSQL's default of 128 MB was a third of an idle
// server's memory. Its pages beyond the cache are read back from the data folder.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { sql } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { EMBEDDED_SHARED_BUFFERS, openDatabase } from '@/db/open';

const dir = mkdtempSync(join(tmpdir(), 'cw-embedded-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const rowsOf = (r: unknown) => (r as { rows: Record<string, unknown>[] }).rows;

describe('the embedded database’s memory', () => {
  it('opens a data folder with the small page cache, and reads back more than the cache holds', async () => {
    const h = await openDatabase({ dataDir: join(dir, 'pglite') });
    try {
      expect(EMBEDDED_SHARED_BUFFERS).toBe('32MB');
      expect(rowsOf(await h.db.execute(sql`show shared_buffers`))[0]).toEqual({ shared_buffers: '32MB' });
      // About 48 MB of rows (6,000 of 8 kB): more than the cache, so pages leave it and come back.
      await h.db.execute(sql`create table bolts (n int primary key, cloth text not null)`);
      // Stored as written (not compressed), so the rows take their full size on disk.
      await h.db.execute(sql`alter table bolts alter column cloth set storage external`);
      await h.db.execute(sql`insert into bolts select n, repeat(md5(n::text), 250) from generate_series(1, 6000) n`);
      const [sum] = rowsOf(await h.db.execute(sql`select count(*)::int as rows, sum(length(cloth))::int as chars from bolts`));
      const size = rowsOf(await h.db.execute(sql`select pg_total_relation_size('bolts')::int as bytes`))[0]!.bytes as number;
      expect(size).toBeGreaterThan(40 * 1024 * 1024);
      expect(sum).toEqual({ rows: 6000, chars: 6000 * 32 * 250 });
    } finally {
      await h.close();
    }
    // A new data folder is set up first (initdb): seconds, more on a busy machine.
  }, 120_000);
});
