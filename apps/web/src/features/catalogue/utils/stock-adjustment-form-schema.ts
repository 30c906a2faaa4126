import { z } from 'zod';

export const stockAdjustmentFormSchema = z.object({
  delta: z
    .string()
    .trim()
    .min(1, 'Enter how many to add (or a negative number to take off).')
    .transform(Number)
    .refine((n) => Number.isFinite(n), 'Enter a number such as 5 or -2.')
    .refine((n) => n !== 0, 'A change of zero changes nothing.'),
  reason: z.string().trim().min(1, 'Say why the stock changes (a count, a delivery, a damaged part…).').max(500),
});

export type StockAdjustmentFormValues = z.input<typeof stockAdjustmentFormSchema>;
