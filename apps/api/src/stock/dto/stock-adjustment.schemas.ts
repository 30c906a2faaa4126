import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { MAX_QUANTITY_CHANGE, roundQuantity } from '../../common/validation/numbers.js';

/** Stock is kept to 3 decimals (numeric(12,3)): inches of hose, or counts. */
export const createStockAdjustmentSchema = z.object({
  delta: z
    .number()
    .finite()
    .transform(roundQuantity)
    .refine((value) => value !== 0, 'Enter a change of at least 0.001 (stock is kept to three decimals).')
    .refine((value) => Math.abs(value) < MAX_QUANTITY_CHANGE, 'This change is too large.'),
  reason: z.string().trim().min(1, 'Say why the stock changes (count, delivery, damage…).').max(500),
});
export class CreateStockAdjustmentDto extends zodDto(createStockAdjustmentSchema) {}
export type NewStockAdjustment = z.output<typeof createStockAdjustmentSchema>;

export interface StockAdjustmentDto {
  id: string;
  partId: string;
  delta: number;
  reason: string;
  actorId: string | null;
  /** Who booked it; null when unknown (e.g. the account was removed). */
  actor: { id: string; displayName: string } | null;
  createdAt: string;
}

export interface StockAdjustmentResult {
  adjustment: StockAdjustmentDto;
  stockOnHand: number;
  version: number;
}
