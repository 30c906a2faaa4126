import type { ConnectionSpec } from '../connections.js';
import type { SealNeed } from '../parts/part.schema.js';
import { parseDash } from './dash.js';
import { iso6149Orings } from './metric.table.js';
import { orbOringAs568 } from './orb.table.js';
import { findRow } from './tables.js';

/**
 * The seal a port connection needs. O-ring boss: AS568 -9NN O-ring (from memory). ISO 6149
 * metric port: its metric O-ring, named "ISO 6149-1 M14x1.5 (11.3x2.2)" since it has no AS568
 * number. Flare seats, NPT (sealant, not a part) and barbs: none.
 */
export function sealForPort(spec: ConnectionSpec): SealNeed | undefined {
  const row = findRow(spec.family, spec.size);
  if (!row) return undefined;
  if (spec.family === 'orb') {
    const dash = parseDash(row.size);
    return dash === undefined ? undefined : { type: 'o-ring', as568: orbOringAs568(dash) };
  }
  if (spec.family === 'metric') {
    const oring = iso6149Orings[row.size];
    return oring === undefined ? undefined : { type: 'o-ring', as568: `ISO 6149-1 ${row.size} (${oring})` };
  }
  return undefined;
}
