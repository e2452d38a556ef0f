// The app's file storage: files on disk beside the database unless something else is plugged in.
import { join } from 'node:path';
import { DATA_DIR } from 'astro:env/server';
import { DiskStorage } from './disk-storage';
import type { Storage } from './storage';

export type { Storage } from './storage';

const holder = globalThis as typeof globalThis & { __cuffwrightStorage?: Storage };

/** The storage every service uses: DATA_DIR/files by default. */
export function fileStorage(): Storage {
  return (holder.__cuffwrightStorage ??= new DiskStorage(join(DATA_DIR, 'files')));
}

/** Plugs in another storage (an object store, or a temporary folder in tests). */
export function useStorage(storage: Storage): void {
  holder.__cuffwrightStorage = storage;
}
