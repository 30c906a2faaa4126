import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import { dirname, resolve } from 'node:path';
import type { Readable } from 'node:stream';
import { fileURLToPath } from 'node:url';
import type { AppConfig } from '../config/app-config.schema.js';
import { AppConfigService } from '../config/app-config.service.js';
import { LocalDiskDriver } from './local-disk.driver.js';
import { S3Driver } from './s3.driver.js';
import type { StorageDriver } from './storage-driver.js';

/** `<repo>/.data/uploads`, found from this file whether it runs from src (tests) or dist. */
export function defaultStorageDir(): string {
  const here = typeof __dirname === 'string' ? __dirname : dirname(fileURLToPath(import.meta.url));
  return resolve(here, '../../../../.data/uploads');
}

type StorageConfig = Pick<
  AppConfig,
  | 'STORAGE_DRIVER'
  | 'STORAGE_DIR'
  | 'S3_ENDPOINT'
  | 'S3_BUCKET'
  | 'S3_REGION'
  | 'S3_ACCESS_KEY_ID'
  | 'S3_SECRET_ACCESS_KEY'
  | 'S3_FORCE_PATH_STYLE'
>;

/** Chooses the driver named by STORAGE_DRIVER (local disk by default). */
export function storageDriverFor(config: StorageConfig): StorageDriver {
  if (config.STORAGE_DRIVER === 's3') {
    if (!config.S3_BUCKET) throw new Error('S3_BUCKET is required when STORAGE_DRIVER=s3');
    return new S3Driver({
      bucket: config.S3_BUCKET,
      region: config.S3_REGION,
      endpoint: config.S3_ENDPOINT,
      accessKeyId: config.S3_ACCESS_KEY_ID,
      secretAccessKey: config.S3_SECRET_ACCESS_KEY,
      forcePathStyle: config.S3_FORCE_PATH_STYLE,
    });
  }
  return new LocalDiskDriver(config.STORAGE_DIR ?? defaultStorageDir());
}

/** The app's one store for uploaded bytes; features never touch disks or buckets directly. */
@Injectable()
export class StorageService implements StorageDriver, OnModuleDestroy {
  private readonly driver: StorageDriver;

  constructor(config: AppConfigService) {
    this.driver = storageDriverFor({
      STORAGE_DRIVER: config.get('STORAGE_DRIVER'),
      STORAGE_DIR: config.get('STORAGE_DIR'),
      S3_ENDPOINT: config.get('S3_ENDPOINT'),
      S3_BUCKET: config.get('S3_BUCKET'),
      S3_REGION: config.get('S3_REGION'),
      S3_ACCESS_KEY_ID: config.get('S3_ACCESS_KEY_ID'),
      S3_SECRET_ACCESS_KEY: config.get('S3_SECRET_ACCESS_KEY'),
      S3_FORCE_PATH_STYLE: config.get('S3_FORCE_PATH_STYLE'),
    });
  }

  put(key: string, body: Buffer, contentType: string): Promise<void> {
    return this.driver.put(key, body, contentType);
  }

  get(key: string): Promise<Readable> {
    return this.driver.get(key);
  }

  delete(key: string): Promise<void> {
    return this.driver.delete(key);
  }

  onModuleDestroy(): void {
    if (this.driver instanceof S3Driver) this.driver.destroy();
  }
}
