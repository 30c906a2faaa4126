import { z } from 'zod';
import { circuitDocumentField } from './circuit-document-field';

/** `GET /api/circuits/:id/draft`: the working sketch and its version for compare-and-set saves. */
export const circuitDraftSchema = z.object({
  document: circuitDocumentField,
  draftVersion: z.number().int(),
});
export type CircuitDraft = z.infer<typeof circuitDraftSchema>;
