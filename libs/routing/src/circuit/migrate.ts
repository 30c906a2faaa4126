import { circuitDocumentSchema, CIRCUIT_SCHEMA, type CircuitDocument } from './document.schema.js';

/** Lifts a raw document of one version to the next; returns the raw next-version document. */
export type CircuitMigration = (raw: Record<string, unknown>) => Record<string, unknown>;

/**
 * Up-migrations keyed by the version they read, each producing the following version.
 * Version 1 is the first published version, so no migration is registered yet; the next
 * version adds `'linesmith.circuit/1': (raw) => ({ ...raw, schema: 'linesmith.circuit/2', … })`.
 */
export const circuitMigrations: Readonly<Record<string, CircuitMigration>> = {};

export class CircuitVersionError extends Error {
  constructor(readonly version: unknown) {
    super(
      `This circuit was saved as ${JSON.stringify(version ?? null)}, which this version of Linesmith cannot read ` +
        `(it reads ${[...Object.keys(circuitMigrations), CIRCUIT_SCHEMA].join(', ')})`,
    );
    this.name = 'CircuitVersionError';
  }
}

/** Runs the up-migrations from the document's own version to `current`. Unknown versions throw. */
export function migrateWith(
  raw: unknown,
  migrations: Readonly<Record<string, CircuitMigration>>,
  current: string,
): Record<string, unknown> {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw new CircuitVersionError(undefined);
  }
  let doc = raw as Record<string, unknown>;
  const seen = new Set<string>();
  while (doc.schema !== current) {
    const version = doc.schema;
    const step = typeof version === 'string' && !seen.has(version) ? migrations[version] : undefined;
    if (!step) throw new CircuitVersionError(version);
    seen.add(version as string);
    doc = step(doc);
  }
  return doc;
}

/** Reads a saved circuit of any known version and returns it validated at the current version. */
export function migrateCircuitDocument(raw: unknown): CircuitDocument {
  return circuitDocumentSchema.parse(migrateWith(raw, circuitMigrations, CIRCUIT_SCHEMA));
}
