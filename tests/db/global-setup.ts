// Before the unit run: a folder for the migrated PGlite snapshot that database test files load
// (0.6 s) instead of creating and migrating their own (4 s). The snapshot itself is made on first
// demand (tests/db/snapshot.ts), so a run of pure test files never builds a database. Skipped
// when TEST_DATABASE_URL points the database tests at a PostgreSQL server instead.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    pgliteSnapshotDir: string;
  }
}

/** Provides the snapshot folder and removes it after the run. */
export default function setup(project: TestProject) {
  if (process.env.TEST_DATABASE_URL) {
    project.provide('pgliteSnapshotDir', '');
    return;
  }
  const dir = mkdtempSync(join(tmpdir(), 'cuffwright-snapshot-'));
  project.provide('pgliteSnapshotDir', dir);
  return () => rmSync(dir, { recursive: true, force: true });
}
