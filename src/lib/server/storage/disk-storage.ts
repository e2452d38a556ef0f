// Storage on the local disk, under one root folder (by default DATA_DIR/files).
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { randomUUID } from 'node:crypto';
import { dirname, join, resolve, sep } from 'node:path';
import { checkKey, type Storage } from './storage';

/** Keeps each key as a file below `root`. */
export class DiskStorage implements Storage {
  private readonly root: string;

  constructor(root: string) {
    this.root = resolve(root);
  }

  private pathOf(key: string): string {
    const path = resolve(join(this.root, checkKey(key)));
    if (!path.startsWith(this.root + sep)) throw new Error(`Refusing storage key ${JSON.stringify(key)}.`);
    return path;
  }

  // The type is not kept on disk: the files table holds it (an object store would keep it here).
  async put(key: string, bytes: Uint8Array, _contentType?: string): Promise<void> {
    const path = this.pathOf(key);
    await mkdir(dirname(path), { recursive: true });
    // Written aside then renamed, so a reader never sees half a photo.
    const part = `${path}.${randomUUID()}.part`;
    await writeFile(part, bytes);
    await rename(part, path);
  }

  async get(key: string): Promise<Uint8Array | null> {
    try {
      return new Uint8Array(await readFile(this.pathOf(key)));
    } catch (e) {
      if ((e as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw e;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }
}
