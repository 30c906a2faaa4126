import { totalLength } from '../geometry/intervals.js';
import { formatInches } from '../units/length-format.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';

export const heatContactRule: Rule = {
  code: 'heat-contact',
  severity: 'blocker',
  title: 'Route touches a heat zone',
  description:
    'A line that touches an exhaust, turbo or other hot part will fail, and fuel or oil on a hot exhaust can catch fire: never route fuel or oil across exhaust without shielding. Where the fabricator marks the zone as shielded (a heat shield stands between the hot part and the line), contact is a caution the reviewer must acknowledge, and the stretch within the clearance is still reported and still needs a sleeve.',
  check(ctx) {
    const flags: Flag[] = [];
    const zones = new Map(ctx.doc.heatZones.map((z) => [z.id, z]));
    for (const line of ctx.lines) {
      for (const exposure of line.heat?.zones ?? []) {
        if (!exposure.contact) continue;
        const zone = zones.get(exposure.zoneId);
        const name = zone?.label || exposure.zoneId;
        const clearanceIn = zone ? (zone.clearanceIn ?? ctx.rules.heatClearanceIn[zone.kind]) : undefined;
        const near = exposure.near.map((i) => `${formatInches(i.start)}–${formatInches(i.end)} in`).join(', ');
        const within = `${formatInches(totalLength(exposure.near))} in of the route lies within the ${clearanceIn === undefined ? '' : `${formatInches(clearanceIn)} in `}clearance (${near} from the from end)`;
        if (zone?.shielded) {
          flags.push({
            code: 'heat-contact',
            severity: 'caution',
            message: `The route runs into heat zone ${name}, marked as shielded; ${within}.`,
            target: lineTarget(line.line.id),
            fix: 'Reviewer: confirm the shield is fitted between the hot part and the line and the stretch is fire-sleeved; otherwise reroute outside the zone.',
          });
          continue;
        }
        flags.push({
          code: 'heat-contact',
          severity: 'blocker',
          message: `The route runs into heat zone ${name}; ${within}.`,
          target: lineTarget(line.line.id),
          fix: 'Reroute the line outside the zone, keeping the shop’s clearance, or fit a heat shield between the hot part and the line and mark the zone as shielded.',
        });
      }
    }
    return flags;
  },
};
