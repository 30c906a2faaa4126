import {
  CIRCUIT_SCHEMA,
  CircuitVersionError,
  migrateCircuitDocument,
  type CircuitDocument,
  type CircuitSettings,
} from '@linesmith/routing';
import { z } from 'zod';
import { ValidationError } from '../common/errors/app-error.js';
import { toIssues } from '../common/validation/zod-validation.pipe.js';

/** A fresh sketch: the circuit's settings and nothing placed yet. */
export function emptyCircuitDocument(settings: CircuitSettings): CircuitDocument {
  return { schema: CIRCUIT_SCHEMA, circuit: settings, calibration: null, background: null, units: [], lines: [], heatZones: [] };
}

/** Reads a document sent by a client: older versions are migrated up; anything invalid is a 400. */
export function parseClientDocument(raw: unknown): CircuitDocument {
  try {
    return migrateCircuitDocument(raw);
  } catch (error) {
    if (error instanceof z.ZodError) throw new ValidationError(toIssues(error), 'The circuit document is not valid.');
    if (error instanceof CircuitVersionError) throw new ValidationError([{ path: 'schema', message: error.message }]);
    throw error;
  }
}

/** Reads a stored document (draft or revision) at the current version. */
export function readStoredDocument(raw: unknown): CircuitDocument {
  return migrateCircuitDocument(raw);
}
