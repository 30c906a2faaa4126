import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client, type S3ClientConfig } from '@aws-sdk/client-s3';
import { Readable } from 'node:stream';
import { StorageObjectMissingError, type StorageDriver } from './storage-driver.js';
import { assertStorageKey } from './storage-key.js';

export interface S3DriverOptions {
  bucket: string;
  region: string;
  /** For S3-compatible services; omitted for AWS itself. */
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  forcePathStyle: boolean;
}

/** One bucket of an S3-compatible object store. */
export class S3Driver implements StorageDriver {
  private readonly client: S3Client;

  constructor(private readonly options: S3DriverOptions) {
    const config: S3ClientConfig = {
      region: options.region,
      endpoint: options.endpoint,
      forcePathStyle: options.forcePathStyle,
    };
    // Without explicit keys the SDK's default chain applies (instance roles, shared config).
    if (options.accessKeyId && options.secretAccessKey) {
      config.credentials = { accessKeyId: options.accessKeyId, secretAccessKey: options.secretAccessKey };
    }
    this.client = new S3Client(config);
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.client.send(
      new PutObjectCommand({ Bucket: this.options.bucket, Key: assertStorageKey(key), Body: body, ContentType: contentType }),
    );
  }

  async get(key: string): Promise<Readable> {
    try {
      const object = await this.client.send(new GetObjectCommand({ Bucket: this.options.bucket, Key: assertStorageKey(key) }));
      if (!(object.Body instanceof Readable)) throw new Error('The object store answered without a readable body.');
      return object.Body;
    } catch (error) {
      if ((error as { name?: string }).name === 'NoSuchKey') throw new StorageObjectMissingError(key);
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.options.bucket, Key: assertStorageKey(key) }));
  }

  /** Closes the SDK's connection pool (tests, shutdown). */
  destroy(): void {
    this.client.destroy();
  }
}
