import { z } from 'zod';

export const ORDER_STATUSES = ['draft', 'sent', 'partially-received', 'received'] as const;
export const orderStatusSchema = z.enum(ORDER_STATUSES);
export type OrderStatus = z.infer<typeof orderStatusSchema>;
