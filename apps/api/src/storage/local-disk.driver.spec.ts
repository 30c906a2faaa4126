import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Readable } from 'node:stream';
import { LocalDiskDriver } from './local-disk.driver.js';
import { StorageObjectMissingError, type StorageDriver } from './storage-driver.js';
import { newStorageKey } from './storage-key.js';

async function bytesOf(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}

const OWNER = '22222222-2222-4222-8222-222222222222';

describe('LocalDiskDriver', () => {
  let root: string;
  let driver: StorageDriver;

  beforeAll(async () => {
    root = await mkdtemp(join(tmpdir(), 'linesmith-storage-'));
    driver = new LocalDiskDriver(root);
  });
  afterAll(() => rm(root, { recursive: true, force: true }));

  it('stores under <root>/<owner>/<uuid>, reads back the same bytes, deletes', async () => {
    const key = newStorageKey(OWNER);
    await driver.put(key, Buffer.from('sketch photo bytes'), 'image/jpeg');
    expect(await readdir(join(root, OWNER))).toEqual([key.split('/')[1]]);
    expect((await bytesOf(await driver.get(key))).toString()).toBe('sketch photo bytes');
    await driver.delete(key);
    await expect(driver.get(key)).rejects.toBeInstanceOf(StorageObjectMissingError);
    await expect(driver.delete(key)).resolves.toBeUndefined();
  });

  it('refuses keys that could leave the folder', async () => {
    for (const key of ['../etc/passwd', `${OWNER}/../x`, '/abs', 'photo.jpg', '']) {
      await expect(driver.put(key, Buffer.from('x'), 'text/plain')).rejects.toThrow(/Refusing storage key/);
    }
  });
});
