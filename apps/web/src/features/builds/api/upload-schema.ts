import { z } from 'zod';

/** `Upload` of the API contract: a stored photo (or price list) with its sniffed type and size. */
export const uploadSchema = z.object({
  id: z.string().min(1),
  buildId: z.string().min(1).nullable(),
  kind: z.enum(['photo', 'price-list']),
  fileName: z.string(),
  mimeType: z.string(),
  sizeBytes: z.number().int().nonnegative(),
  width: z.number().int().nonnegative().nullable(),
  height: z.number().int().nonnegative().nullable(),
  createdAt: z.iso.datetime({ offset: true }),
  uploadedBy: z.union([z.string(), z.object({ id: z.string(), displayName: z.string() })]).nullable(),
});
export type Upload = z.infer<typeof uploadSchema>;

export const uploadListSchema = z.array(uploadSchema);
