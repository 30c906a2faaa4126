import { z } from 'zod';
import { circuitDocumentField } from './circuit-document-field';

export const revisionSummarySchema = z.object({
  id: z.string().min(1),
  number: z.number().int().positive(),
  message: z.string().nullish().transform((v) => v ?? ''),
  author: z.object({ id: z.string().min(1), displayName: z.string() }),
  createdAt: z.iso.datetime({ offset: true }),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

export const revisionListSchema = z.array(revisionSummarySchema);

/** One saved revision with its (immutable) document. */
export const revisionSchema = z.looseObject({ ...revisionSummarySchema.shape, document: circuitDocumentField });
export type Revision = z.infer<typeof revisionSchema>;
