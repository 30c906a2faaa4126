import type { DocumentComparison } from '@linesmith/routing';
import { z } from 'zod';
import { circuitDocumentField } from '../../circuits/api/circuit-document-field';
import { evaluationSchema } from './evaluation-schema';

/** A side of a comparison: a revision number or the working draft. */
export type RevisionRef = number | 'draft';

/** Reads `from`/`to` of the address bar; anything else is no choice. */
export function parseRevisionRef(text: string | null): RevisionRef | null {
  if (text === 'draft') return 'draft';
  if (text === null || !/^\d+$/.test(text)) return null;
  const n = Number(text);
  return n > 0 ? n : null;
}

const ids = z.array(z.string());
const lineItemChanges = z.object({ lineId: z.string(), added: ids, removed: ids, changed: ids });

/** `compareDocuments(...)` of the routing lib, as `GET /api/circuits/:id/compare` sends it. */
export const documentComparisonSchema = z.object({
  settings: ids,
  units: z.object({ added: ids, removed: ids, moved: ids, changed: ids }),
  lines: z.object({
    added: ids,
    removed: ids,
    rerouted: z.array(
      z.object({ lineId: z.string(), oldCutLengthIn: z.number().finite().nullish(), newCutLengthIn: z.number().finite().nullish() }),
    ),
    partsSwapped: z.array(z.object({ lineId: z.string(), slot: z.enum(['hose', 'end-from', 'end-to']), oldPartIds: ids, newPartIds: ids })),
  }),
  heatZones: z.object({ added: ids, removed: ids, changed: ids }),
  supports: z.array(lineItemChanges),
  sleeves: z.array(lineItemChanges),
  changedIds: ids,
}) satisfies z.ZodType<DocumentComparison>;

const side = z.object({ document: circuitDocumentField, evaluation: evaluationSchema });

export const comparisonResultSchema = z.object({ comparison: documentComparisonSchema, before: side, after: side });
export type ComparisonResult = z.infer<typeof comparisonResultSchema>;
export type ComparisonSide = z.infer<typeof side>;
