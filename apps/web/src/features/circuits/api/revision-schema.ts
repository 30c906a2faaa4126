import type { CircuitDocument } from '@linesmith/routing';
import { z } from 'zod';
import { userRefSchema, type UserRef } from '../../../lib/contract/user-ref-schema';
import { circuitDocumentField } from './circuit-document-field';

/** A revision's header; `author` is null once the account is gone. */
const revisionFields = {
  id: z.string().min(1),
  number: z.number().int().positive(),
  message: z.string(),
  author: userRefSchema.nullable(),
  createdAt: z.iso.datetime({ offset: true }),
};

export interface RevisionSummary {
  id: string;
  number: number;
  message: string;
  author: UserRef | null;
  createdAt: string;
}

export interface Revision extends RevisionSummary {
  document: CircuitDocument;
}

const summaryOf = (raw: z.output<z.ZodObject<typeof revisionFields>>): RevisionSummary => ({
  id: raw.id,
  number: raw.number,
  message: raw.message,
  author: raw.author,
  createdAt: raw.createdAt,
});

export const revisionSummarySchema = z.object(revisionFields).transform(summaryOf);

export const revisionListSchema = z.array(revisionSummarySchema);

/** One saved revision with its (immutable) document. */
export const revisionSchema = z
  .object({ ...revisionFields, document: circuitDocumentField })
  .transform((raw): Revision => ({ ...summaryOf(raw), document: raw.document }));
