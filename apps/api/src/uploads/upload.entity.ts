import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { BuildEntity } from '../builds/build.entity.js';
import { ShopEntity } from '../shops/shop.entity.js';
import { UserEntity } from '../users/user.entity.js';
import type { UploadKind } from './upload-kind.js';

/** A stored file's record; the bytes live in the storage service under `storageKey`. */
@Entity({ name: 'uploads' })
@Index('idx_uploads_shop_build', ['shopId', 'buildId'])
@Check('ck_uploads_kind', `"kind" IN ('photo','price-list')`)
@Check('ck_uploads_size', `"size_bytes" > 0`)
export class UploadEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_uploads' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_uploads_shop' })
  shop?: ShopEntity;

  /** Set for build photos; null for files that belong to the shop as a whole (price lists). */
  @Column({ name: 'build_id', type: 'uuid', nullable: true })
  buildId: string | null;

  @ManyToOne(() => BuildEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'build_id', foreignKeyConstraintName: 'fk_uploads_build' })
  build?: BuildEntity | null;

  @Column({ type: 'text' })
  kind: UploadKind;

  /** The sender's file name without any path parts; shown to users, never used as a storage key. */
  @Column({ name: 'file_name', type: 'text' })
  fileName: string;

  /** Sniffed from the bytes, not taken from the request. */
  @Column({ name: 'mime_type', type: 'text' })
  mimeType: string;

  @Column({ name: 'size_bytes', type: 'integer' })
  sizeBytes: number;

  @Column({ type: 'text' })
  sha256: string;

  @Index('uq_uploads_storage_key', { unique: true })
  @Column({ name: 'storage_key', type: 'text' })
  storageKey: string;

  /** As displayed: EXIF orientations 5–8 swap the stored width and height. */
  @Column({ name: 'width_px', type: 'integer', nullable: true })
  widthPx: number | null;

  @Column({ name: 'height_px', type: 'integer', nullable: true })
  heightPx: number | null;

  @Column({ name: 'uploaded_by', type: 'uuid', nullable: true })
  uploadedById: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'uploaded_by', foreignKeyConstraintName: 'fk_uploads_uploaded_by' })
  uploadedBy?: UserEntity | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
