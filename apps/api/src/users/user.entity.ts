import {
  Check,
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  VersionColumn,
} from 'typeorm';
import { ShopEntity } from '../shops/shop.entity.js';
import type { Role } from './role.js';

/** E-mails are stored lower-cased; the expression index (see the migration) enforces uniqueness. */
@Entity({ name: 'users' })
@Index('uq_users_email_lower', { synchronize: false })
@Check('ck_users_roles', `"roles" <@ ARRAY['admin','fabricator','parts-clerk','reviewer']::text[]`)
export class UserEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_users' })
  id: string;

  @Index('idx_users_shop_id')
  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_users_shop' })
  shop?: ShopEntity;

  @Column({ type: 'text' })
  email: string;

  @Column({ name: 'display_name', type: 'text' })
  displayName: string;

  /** argon2id PHC string; null until the user sets a password (invitation pending). */
  @Column({ name: 'password_hash', type: 'text', nullable: true, select: false })
  passwordHash: string | null;

  @Column({ type: 'text', array: true, default: () => "'{}'" })
  roles: Role[];

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @VersionColumn()
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
