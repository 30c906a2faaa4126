import type { ConnectionSpec } from '../connections.js';
import type { Part } from './part.schema.js';

/** The connection ends a part presents: both ends of an adapter or bulkhead, a hose end's port side, a plug's end. */
export function partConnections(part: Part): ConnectionSpec[] {
  switch (part.kind) {
    case 'adapter':
    case 'bulkhead':
      return [part.attributes.a, part.attributes.b];
    case 'hose-end':
      return [part.attributes.port];
    case 'plug':
      return [part.attributes.connection];
    default:
      return [];
  }
}
