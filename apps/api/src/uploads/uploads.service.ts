import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { DataSource, Repository } from 'typeorm';
import { BuildsService } from '../builds/builds.service.js';
import { ConflictError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { StorageObjectMissingError } from '../storage/storage-driver.js';
import { newStorageKey } from '../storage/storage-key.js';
import { StorageService } from '../storage/storage.service.js';
import type { UploadDto } from './dto/upload.dto.js';
import { sanitizeFileName } from './file-name.js';
import { readPhoto } from './photo-info.js';
import { PHOTO_MAX_BYTES, PhotoTooLargeError } from './upload-errors.js';
import type { UploadKind } from './upload-kind.js';
import { UploadEntity } from './upload.entity.js';
import { toUploadDto } from './upload.mapper.js';

/** The parts of a multer file the service reads. */
export interface ReceivedFile {
  originalname: string;
  mimetype: string;
  size: number;
  buffer: Buffer;
}

/** A checked file ready to keep: other features (e.g. price-list import) store through `saveFile`. */
export interface NewUpload {
  kind: UploadKind;
  buildId: string | null;
  fileName: string;
  mimeType: string;
  bytes: Buffer;
  widthPx: number | null;
  heightPx: number | null;
}

/** Circuits whose draft or saved versions use an upload as their sketch background. */
const CIRCUITS_USING_UPLOAD_SQL = `
  SELECT DISTINCT c."name" FROM "circuits" c
  LEFT JOIN "circuit_revisions" r ON r."circuit_id" = c."id"
  WHERE c."shop_id" = $1
    AND (c."draft" -> 'background' ->> 'uploadId' = $2 OR r."document" -> 'background' ->> 'uploadId' = $2)
  ORDER BY c."name"`;

/** Files of one shop: bytes in the storage service, a row per file here. */
@Injectable()
export class UploadsService {
  private readonly logger = new Logger(UploadsService.name);

  constructor(
    @InjectRepository(UploadEntity) private readonly uploads: Repository<UploadEntity>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly storage: StorageService,
    private readonly builds: BuildsService,
  ) {}

  /** A build photo: identified by its bytes, measured, then stored. */
  async addPhoto(shopId: string, userId: string, buildId: string, file: ReceivedFile | undefined): Promise<UploadDto> {
    await this.builds.getOwn(shopId, buildId);
    if (!file) throw new ValidationError([{ path: 'file', message: 'Attach the photo in the "file" field.' }]);
    if (file.size === 0 || file.buffer.length === 0) {
      throw new ValidationError([{ path: 'file', message: 'The file is empty.' }], 'The file is empty.');
    }
    if (file.buffer.length > PHOTO_MAX_BYTES) throw new PhotoTooLargeError();
    const fileName = sanitizeFileName(file.originalname, 'photo');
    const photo = readPhoto(file.buffer, fileName, file.mimetype);
    return this.saveFile(shopId, userId, {
      kind: 'photo',
      buildId,
      fileName,
      mimeType: photo.mimeType,
      bytes: file.buffer,
      widthPx: photo.widthPx,
      heightPx: photo.heightPx,
    });
  }

  /** Stores checked bytes under a fresh key and records them; the bytes are removed again if the record fails. */
  async saveFile(shopId: string, userId: string, upload: NewUpload): Promise<UploadDto> {
    const storageKey = newStorageKey(shopId);
    await this.storage.put(storageKey, upload.bytes, upload.mimeType);
    try {
      const row = await this.uploads.save(
        this.uploads.create({
          shopId,
          buildId: upload.buildId,
          kind: upload.kind,
          fileName: upload.fileName,
          mimeType: upload.mimeType,
          sizeBytes: upload.bytes.length,
          sha256: createHash('sha256').update(upload.bytes).digest('hex'),
          storageKey,
          widthPx: upload.widthPx,
          heightPx: upload.heightPx,
          uploadedById: userId,
        }),
      );
      return toUploadDto(row);
    } catch (error) {
      await this.storage.delete(storageKey).catch(() => undefined);
      throw error;
    }
  }

  async listForBuild(shopId: string, buildId: string): Promise<UploadDto[]> {
    await this.builds.getOwn(shopId, buildId);
    const rows = await this.uploads.find({ where: { shopId, buildId }, order: { createdAt: 'ASC', id: 'ASC' } });
    return rows.map(toUploadDto);
  }

  async getOwn(shopId: string, uploadId: string): Promise<UploadEntity> {
    const upload = await this.uploads.findOneBy({ id: uploadId, shopId });
    if (!upload) throw new NotFoundError('The file');
    return upload;
  }

  async openContent(shopId: string, uploadId: string): Promise<{ upload: UploadEntity; stream: Readable }> {
    const upload = await this.getOwn(shopId, uploadId);
    try {
      return { upload, stream: await this.storage.get(upload.storageKey) };
    } catch (error) {
      if (error instanceof StorageObjectMissingError) {
        this.logger.error(`Upload ${upload.id} has no stored bytes under ${upload.storageKey}`);
        throw new NotFoundError('The file');
      }
      throw error;
    }
  }

  /** Refused while a circuit's sketch (its draft or a saved version) uses the photo as background. */
  async remove(shopId: string, uploadId: string): Promise<void> {
    const upload = await this.getOwn(shopId, uploadId);
    // One transaction holding the upload row for update: a draft save share-locks the photo it
    // names, so it either commits first (and is seen here) or waits and then finds no photo.
    await this.dataSource.transaction(async (tx) => {
      const locked = await tx
        .getRepository(UploadEntity)
        .createQueryBuilder('upload')
        .select('upload.id')
        .where('upload.id = :uploadId AND upload.shop_id = :shopId', { uploadId: upload.id, shopId })
        .setLock('pessimistic_write')
        .getOne();
      if (!locked) throw new NotFoundError('The file');
      const users: Array<{ name: string }> = await tx.query(CIRCUITS_USING_UPLOAD_SQL, [shopId, upload.id]);
      if (users.length > 0) {
        throw new ConflictError(
          `This photo is the sketch background of ${users.map((row) => `"${row.name}"`).join(', ')}. Choose another background first.`,
        );
      }
      await tx.getRepository(UploadEntity).delete({ id: upload.id, shopId });
    });
    // The record is gone first: a failed delete leaves unreachable bytes, never a record without bytes.
    await this.storage.delete(upload.storageKey).catch((error: unknown) => {
      this.logger.warn(`Could not delete stored bytes ${upload.storageKey}: ${String(error)}`);
    });
  }
}
