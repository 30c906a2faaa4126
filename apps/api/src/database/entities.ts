import { UserTokenEntity } from '../auth/user-token.entity.js';
import { OutboxEntity } from '../mail/outbox.entity.js';
import { OrderLineEntity } from '../orders/order-line.entity.js';
import { OrderEntity } from '../orders/order.entity.js';
import { StockAdjustmentEntity } from '../stock/stock-adjustment.entity.js';
import { RefreshTokenEntity } from '../auth/refresh-token.entity.js';
import { BuildEntity } from '../builds/build.entity.js';
import { CircuitRevisionEntity } from '../circuits/circuit-revision.entity.js';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { PartEntity } from '../parts/part.entity.js';
import { ShopRulesEntity } from '../shop-rules/shop-rules.entity.js';
import { ShopEntity } from '../shops/shop.entity.js';
import { SupplierEntity } from '../suppliers/supplier.entity.js';
import { UploadEntity } from '../uploads/upload.entity.js';
import { UserEntity } from '../users/user.entity.js';
import { AuditEventEntity } from '../audit/audit-event.entity.js';
import { NotificationEntity } from '../notifications/notification.entity.js';
import { ReviewAcknowledgementEntity } from '../reviews/review-acknowledgement.entity.js';
import { ReviewEntity } from '../reviews/review.entity.js';
import { OrderReceiptEntity } from '../orders/order-receipt.entity.js';
import { OrderSourceEntity } from '../orders/order-source.entity.js';

/** Every entity, listed explicitly (no globs) so the same list works from TS sources and from dist. */
export const ENTITIES = [
  ShopEntity,
  UserEntity,
  RefreshTokenEntity,
  SupplierEntity,
  PartEntity,
  ShopRulesEntity,
  BuildEntity,
  CircuitEntity,
  CircuitRevisionEntity,
  UploadEntity,
  OutboxEntity,
  UserTokenEntity,
  StockAdjustmentEntity,
  OrderEntity,
  OrderLineEntity,
  OrderSourceEntity,
  OrderReceiptEntity,
  ReviewEntity,
  ReviewAcknowledgementEntity,
  AuditEventEntity,
  NotificationEntity,
];
