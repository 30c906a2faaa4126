import type { CircuitDocument } from '@linesmith/routing';
import { z } from 'zod';
import { circuitDocumentField } from './circuit-document-field';

/**
 * A revision's header. The contract sends `author: { id, displayName }`; the API as built sends
 * only `authorId`, read here as an author without a name.
 */
const revisionFields = {
  id: z.string().min(1),
  number: z.number().int().positive(),
  message: z.string().nullish().transform((v) => v ?? ''),
  author: z.object({ id: z.string().min(1), displayName: z.string() }).nullish(),
  authorId: z.string().nullish(),
  createdAt: z.iso.datetime({ offset: true }),
};

export interface RevisionSummary {
  id: string;
  number: number;
  message: string;
  author: { id: string; displayName: string } | null;
  createdAt: string;
}

export interface Revision extends RevisionSummary {
  document: CircuitDocument;
}

const summaryOf = (raw: z.output<z.ZodObject<typeof revisionFields>>): RevisionSummary => ({
  id: raw.id,
  number: raw.number,
  message: raw.message,
  author: raw.author ?? (raw.authorId ? { id: raw.authorId, displayName: '' } : null),
  createdAt: raw.createdAt,
});

export const revisionSummarySchema = z.object(revisionFields).transform(summaryOf);

export const revisionListSchema = z.array(revisionSummarySchema);

/** One saved revision with its (immutable) document. */
export const revisionSchema = z
  .object({ ...revisionFields, document: circuitDocumentField })
  .transform((raw): Revision => ({ ...summaryOf(raw), document: raw.document }));
