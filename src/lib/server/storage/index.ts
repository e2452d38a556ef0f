// The app's file storage: files on disk beside the database (one machine), or an S3-compatible
// object store when STORAGE=s3 (several servers), unless something else is plugged in.
import { join } from 'node:path';
import { DATA_DIR, STORAGE, S3_BUCKET, S3_PREFIX, S3_REGION, S3_ENDPOINT, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_FORCE_PATH_STYLE } from 'astro:env/server';
import { dataDir } from '@/db/app-paths';
import { DiskStorage } from './disk-storage';
import { s3FromSettings } from './s3-storage';
import type { Storage } from './storage';

export type { Storage } from './storage';

const holder = globalThis as typeof globalThis & { __cuffwrightStorage?: Storage };

/** The storage the settings choose; throws with the missing setting named when they are incomplete. */
function fromSettings(): Storage {
  if (STORAGE !== 's3') return new DiskStorage(join(dataDir(DATA_DIR), 'files'));
  const s3 = s3FromSettings({ STORAGE, S3_BUCKET, S3_PREFIX, S3_REGION, S3_ENDPOINT, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_FORCE_PATH_STYLE });
  if (typeof s3 === 'string') throw new Error(s3);
  return s3;
}

/** The storage every service uses: DATA_DIR/files by default, the bucket when STORAGE=s3. */
export function fileStorage(): Storage {
  return (holder.__cuffwrightStorage ??= fromSettings());
}

/** Plugs in another storage (an object store, or a temporary folder in tests). */
export function useStorage(storage: Storage): void {
  holder.__cuffwrightStorage = storage;
}
