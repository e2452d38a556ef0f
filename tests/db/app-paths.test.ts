// The migrations and the default data folder are found from the app's own files, so a server
// started from another folder (a service manager's working directory) still finds them.
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { appRoot, dataDir, migrationsDir } from '@/db/app-paths';

const started = process.cwd();
afterEach(() => process.chdir(started));

describe('app paths', () => {
  it('find drizzle/ and data/ beside the code, whatever the working folder', () => {
    process.chdir('/tmp');
    expect(existsSync(join(migrationsDir(), 'meta', '_journal.json'))).toBe(true);
    expect(dataDir(undefined)).toBe(join(appRoot(), 'data'));
    expect(appRoot()).toBe(started);
  });

  it('keep a DATA_DIR that was set: absolute as is, relative to the folder started from', () => {
    expect(dataDir('/srv/cuffwright')).toBe('/srv/cuffwright');
    process.chdir('/tmp');
    expect(dataDir('shop-data')).toBe(resolve('/tmp', 'shop-data'));
  });
});
