import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { ShopEntity } from '../shops/shop.entity.js';
import { UserEntity } from '../users/user.entity.js';
import { ReviewEntity } from './review.entity.js';

/** A reviewer's note accepting one caution (by its flag key) of the revision under review. */
@Entity({ name: 'review_acknowledgements' })
@Index('uq_review_acknowledgements_key', ['reviewId', 'flagKey'], { unique: true })
export class ReviewAcknowledgementEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_review_acknowledgements' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_review_acknowledgements_shop' })
  shop?: ShopEntity;

  @Column({ name: 'review_id', type: 'uuid' })
  reviewId: string;

  @ManyToOne(() => ReviewEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'review_id', foreignKeyConstraintName: 'fk_review_acknowledgements_review' })
  review?: ReviewEntity;

  @Column({ name: 'flag_key', type: 'text' })
  flagKey: string;

  @Column({ type: 'text' })
  note: string;

  @Column({ name: 'by_user_id', type: 'uuid', nullable: true })
  byId: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'by_user_id', foreignKeyConstraintName: 'fk_review_acknowledgements_by' })
  by?: UserEntity | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
