import type { ConnectionSpec } from '../connections.js';
import type { SealNeed } from '../parts/part.schema.js';
import { parseDash } from './dash.js';
import { iso6149Orings, parseMetricDesignation } from './metric.table.js';
import { orbOringAs568 } from './orb.table.js';
import { orfsFaceOringAs568 } from './orfs.table.js';
import { seatFormInfo, seatOf } from './seat-forms.js';
import { findRow } from './tables.js';

/** "M14x1.5" → "M14"; "3/8-24" → "3/8 in": how washers are sized (by the thread they fit over). */
function washerSize(size: string): string {
  const metric = parseMetricDesignation(size);
  if (metric) return `M${metric.diameterMm}`;
  return `${size.replace(/-\d+(?:\.\d+)?$/, '')} in`;
}

/**
 * The separate seals one joint at a port needs, in the order they go on:
 * - O-ring boss: AS568 -9NN O-ring (from memory).
 * - O-ring face seal: the face O-ring, AS568 -0NN (from memory).
 * - Metric and BSP parallel: by seat form — the ISO 6149-1 O-ring ("ISO 6149-1 M14x1.5 (11.3x2.2)",
 *   it has no AS568 number), a bonded washer of the thread size, an ISO 1179-3 O-ring, or none
 *   for sealing-edge studs and cones.
 * - Banjo: two crush washers of the bolt size, one each side of the banjo eye (common practice).
 * - Flare seats, pipe threads (sealant, not a part), quick-connects (sealed inside the
 *   connector) and barbs: none.
 */
export function sealsForPort(spec: ConnectionSpec): SealNeed[] {
  const row = findRow(spec.family, spec.size);
  if (!row) return [];
  switch (spec.family) {
    case 'orb': {
      const dash = parseDash(row.size);
      return dash === undefined ? [] : [{ type: 'o-ring', as568: orbOringAs568(dash) }];
    }
    case 'orfs': {
      const dash = parseDash(row.size);
      const as568 = dash === undefined ? undefined : orfsFaceOringAs568(dash);
      return as568 === undefined ? [] : [{ type: 'o-ring', as568 }];
    }
    case 'metric':
    case 'bspp': {
      const seat = seatOf(spec);
      const info = seat === undefined ? undefined : seatFormInfo(spec.family, seat);
      if (!info) return [];
      if (info.seal === 'bonded-washer') {
        return [{ type: 'bonded-washer', size: spec.family === 'metric' ? washerSize(row.size) : `${row.size} BSP` }];
      }
      if (info.seal !== 'o-ring') return [];
      if (spec.family === 'bspp') return [{ type: 'o-ring', as568: `ISO 1179-3 G ${row.size}` }];
      const oring = iso6149Orings[row.size];
      return oring === undefined ? [] : [{ type: 'o-ring', as568: `ISO 6149-1 ${row.size} (${oring})` }];
    }
    case 'banjo': {
      const washer: SealNeed = { type: 'crush-washer', size: washerSize(row.size) };
      return [washer, { ...washer }];
    }
    default:
      return [];
  }
}

/** The first seal a port needs (see `sealsForPort`), or undefined. */
export function sealForPort(spec: ConnectionSpec): SealNeed | undefined {
  return sealsForPort(spec)[0];
}
