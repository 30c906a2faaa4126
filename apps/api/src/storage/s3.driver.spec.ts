import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Readable } from 'node:stream';
import S3rver from 's3rver';
import { S3Driver } from './s3.driver.js';
import { StorageObjectMissingError } from './storage-driver.js';
import { newStorageKey } from './storage-key.js';

async function bytesOf(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}

const OWNER = '11111111-1111-4111-8111-111111111111';

describe('S3Driver against a local fake S3 server (s3rver on loopback)', () => {
  let directory: string;
  let server: S3rver;
  let driver: S3Driver;

  beforeAll(async () => {
    directory = await mkdtemp(join(tmpdir(), 'linesmith-s3rver-'));
    server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory, configureBuckets: [{ name: 'photos' }] });
    const { port } = await server.run();
    driver = new S3Driver({
      bucket: 'photos',
      region: 'us-east-1',
      endpoint: `http://127.0.0.1:${port}`,
      // s3rver accepts these fixed keys; they are no secret.
      accessKeyId: 'S3RVER',
      secretAccessKey: 'S3RVER',
      forcePathStyle: true,
    });
  });

  afterAll(async () => {
    driver.destroy();
    await server.close();
    await rm(directory, { recursive: true, force: true });
  });

  it('puts, gets back the same bytes, and deletes', async () => {
    const key = newStorageKey(OWNER);
    const body = Buffer.from(Array.from({ length: 70_000 }, (_, i) => (i * 7) % 256));
    await driver.put(key, body, 'image/png');
    expect((await bytesOf(await driver.get(key))).equals(body)).toBe(true);

    await driver.delete(key);
    await expect(driver.get(key)).rejects.toBeInstanceOf(StorageObjectMissingError);
    await expect(driver.delete(key)).resolves.toBeUndefined();
  });

  it('refuses keys it did not make', async () => {
    await expect(driver.put('../escape', Buffer.from('x'), 'text/plain')).rejects.toThrow(/Refusing storage key/);
  });
});
