import { z } from 'zod';

/** One entry of a part's stock history (`GET /api/parts/:id/stock-adjustments`). */
export const stockAdjustmentSchema = z.looseObject({
  delta: z.number(),
  reason: z.string(),
  actor: z.object({ displayName: z.string() }).nullish(),
  createdAt: z.iso.datetime({ offset: true }),
});
export type StockAdjustment = z.output<typeof stockAdjustmentSchema>;

export const stockHistorySchema = z.array(stockAdjustmentSchema);

export interface StockAdjustmentInput {
  delta: number;
  reason: string;
}
