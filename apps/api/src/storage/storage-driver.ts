import type { Readable } from 'node:stream';

/** Where uploaded bytes live. Keys come from `newStorageKey` only, never from user input. */
export interface StorageDriver {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** Rejects with `StorageObjectMissingError` when nothing is stored under the key. */
  get(key: string): Promise<Readable>;
  /** Removing a key that holds nothing is not an error. */
  delete(key: string): Promise<void>;
}

export class StorageObjectMissingError extends Error {
  constructor(readonly key: string) {
    super(`Nothing is stored under "${key}".`);
    this.name = 'StorageObjectMissingError';
  }
}
