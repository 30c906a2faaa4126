import { formatInches } from '../units/length-format.js';
import type { Flag } from './flag.js';
import { partName, type Rule } from './rule.js';

/** Below this deflection a corner point is a straight run, not a bend. */
const STRAIGHT_RAD = 1e-6;

export const bendRadiusRule: Rule = {
  code: 'bend-radius',
  severity: 'blocker',
  title: 'Bend too tight',
  description:
    'Each corner of a route must be bent no tighter than the hose’s minimum bend radius, and two bends need room between them: when their curves overlap the route cannot be built as drawn.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const detail = line.centreline;
      if (!detail) continue;
      const lineId = line.line.id;
      const minRadius = line.hose?.attributes.minBendRadiusIn;
      if (line.hose && minRadius !== undefined) {
        for (const bend of detail.bends) {
          if (bend.deflectionRad < STRAIGHT_RAD || bend.radiusIn >= minRadius) continue;
          const corner = bend.pointIndex - 1; // route point 0 is the from port
          flags.push({
            code: 'bend-radius',
            severity: 'blocker',
            message: `Corner ${corner + 1} is bent at ${formatInches(bend.radiusIn)} in radius; ${partName(line.hose)} needs at least ${formatInches(minRadius)} in.`,
            target: { kind: 'line', id: lineId, lineId, index: corner },
            fix: 'Open the bend up, add a 45° or 90° hose end, or reroute.',
          });
        }
      }
      if (!detail.fits) {
        flags.push({
          code: 'bend-radius',
          severity: 'blocker',
          message: 'Two bends overlap (or a bend turns back on itself): the route cannot be bent as drawn.',
          target: { kind: 'line', id: lineId, lineId },
          fix: 'Lengthen the straight between the bends or use smaller radii that the hose allows.',
        });
      }
    }
    return flags;
  },
};
