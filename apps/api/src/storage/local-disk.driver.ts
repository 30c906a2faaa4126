import { createReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import type { Readable } from 'node:stream';
import { randomUUID } from 'node:crypto';
import { StorageObjectMissingError, type StorageDriver } from './storage-driver.js';
import { assertStorageKey } from './storage-key.js';

/** Files under one folder, one file per key; writes land whole (temp file, then rename). */
export class LocalDiskDriver implements StorageDriver {
  constructor(private readonly root: string) {}

  async put(key: string, body: Buffer): Promise<void> {
    const path = this.pathOf(key);
    await mkdir(dirname(path), { recursive: true });
    const temp = `${path}.${randomUUID()}.part`;
    await writeFile(temp, body, { flag: 'wx' });
    await rename(temp, path);
  }

  async get(key: string): Promise<Readable> {
    const path = this.pathOf(key);
    try {
      await stat(path);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') throw new StorageObjectMissingError(key);
      throw error;
    }
    return createReadStream(path);
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }

  private pathOf(key: string): string {
    return join(this.root, ...assertStorageKey(key).split('/'));
  }
}
