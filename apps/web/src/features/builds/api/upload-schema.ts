import { z } from 'zod';

const pixels = z.number().int().positive().nullable();

/** `Upload` of the API: a stored photo (or price list) with its sniffed type, size and, for photos, pixel size. */
export const uploadSchema = z.object({
  id: z.string().min(1),
  buildId: z.string().min(1).nullable(),
  kind: z.enum(['photo', 'price-list']),
  fileName: z.string(),
  mimeType: z.string(),
  sizeBytes: z.number().int().nonnegative(),
  widthPx: pixels,
  heightPx: pixels,
  uploadedById: z.string().min(1).nullable(),
  createdAt: z.iso.datetime({ offset: true }),
});
export type Upload = z.infer<typeof uploadSchema>;

export const uploadListSchema = z.array(uploadSchema);
