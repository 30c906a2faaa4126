import { z } from 'zod';

/** A photo of a build (sketch background) or a supplier price list (catalogue import). */
export const UPLOAD_KINDS = ['photo', 'price-list'] as const;
export const uploadKindSchema = z.enum(UPLOAD_KINDS);
export type UploadKind = z.infer<typeof uploadKindSchema>;
