import { z } from 'zod';

const pixels = z.number().int().nonnegative().nullish();

/**
 * `Upload` of the API contract: a stored photo (or price list) with its sniffed type and size.
 * The API as built names the dimensions `widthPx`/`heightPx` and the uploader `uploadedById`;
 * both spellings read the same.
 */
export const uploadSchema = z
  .looseObject({
    id: z.string().min(1),
    buildId: z.string().min(1).nullable(),
    kind: z.enum(['photo', 'price-list']),
    fileName: z.string(),
    mimeType: z.string(),
    sizeBytes: z.number().int().nonnegative(),
    width: pixels,
    height: pixels,
    widthPx: pixels,
    heightPx: pixels,
    createdAt: z.iso.datetime({ offset: true }),
  })
  .transform(({ id, buildId, kind, fileName, mimeType, sizeBytes, width, height, widthPx, heightPx, createdAt }) => ({
    id,
    buildId,
    kind,
    fileName,
    mimeType,
    sizeBytes,
    width: width ?? widthPx ?? null,
    height: height ?? heightPx ?? null,
    createdAt,
  }));
export type Upload = z.output<typeof uploadSchema>;

export const uploadListSchema = z.array(uploadSchema);
