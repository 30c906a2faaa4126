import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';

/** Stock is kept to 3 decimals (numeric(12,3)): inches of hose, or counts. */
export const createStockAdjustmentSchema = z.object({
  delta: z
    .number()
    .finite()
    .refine((value) => value !== 0, 'Enter a change other than zero.')
    .refine((value) => Math.abs(value) < 1e8, 'This change is too large.')
    .transform((value) => Math.round(value * 1000) / 1000),
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
