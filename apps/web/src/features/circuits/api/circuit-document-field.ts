import { migrateCircuitDocument, type CircuitDocument } from '@linesmith/routing';
import { z } from 'zod';

/**
 * A stored circuit document, read through the routing lib's migrations so revisions saved under
 * an older schema version stay readable.
 */
export const circuitDocumentField = z.unknown().transform((raw, ctx): CircuitDocument => {
  try {
    return migrateCircuitDocument(raw);
  } catch (error) {
    ctx.addIssue({ code: 'custom', message: error instanceof Error ? error.message : 'Not a circuit document' });
    return z.NEVER;
  }
});
