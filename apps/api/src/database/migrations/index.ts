import { CreateShopsUsersRefreshTokens1764650000000 } from './1764650000000-create-shops-users-refresh-tokens.js';
import { CreateSuppliersParts1796185836552 } from './1796185836552-create-suppliers-parts.js';
import { CreateShopRules1796185848071 } from './1796185848071-create-shop-rules.js';
import { CreateBuildsCircuitsUploads1796185917823 } from './1796185917823-create-builds-circuits-uploads.js';
import { CreateOutboxTokensStockOrders1796186373635 } from './1796186373635-create-outbox-tokens-stock-orders.js';
import { CreateReviewsAuditNotifications1796186679267 } from './1796186679267-create-reviews-audit-notifications.js';
import { StoreApprovedEvaluation1796300000000 } from './1796300000000-store-approved-evaluation.js';
import { TrustSessionsIdempotencyLimits1796400000000 } from './1796400000000-trust-sessions-idempotency-limits.js';

/** Every migration in order of its timestamp; add new ones at the end. */
export const MIGRATIONS = [
  CreateShopsUsersRefreshTokens1764650000000,
  CreateSuppliersParts1796185836552,
  CreateShopRules1796185848071,
  CreateBuildsCircuitsUploads1796185917823,
  CreateOutboxTokensStockOrders1796186373635,
  CreateReviewsAuditNotifications1796186679267,
  StoreApprovedEvaluation1796300000000,
  TrustSessionsIdempotencyLimits1796400000000,
];
