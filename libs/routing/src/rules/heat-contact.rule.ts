import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';

export const heatContactRule: Rule = {
  code: 'heat-contact',
  severity: 'blocker',
  title: 'Route touches a heat zone',
  description:
    'A line that touches an exhaust, turbo or other hot part will fail, and fuel or oil on a hot exhaust can catch fire. Never route fuel or oil across exhaust without shielding.',
  check(ctx) {
    const flags: Flag[] = [];
    const labels = new Map(ctx.doc.heatZones.map((z) => [z.id, z.label || z.id]));
    for (const line of ctx.lines) {
      for (const zone of line.heat?.zones ?? []) {
        if (!zone.contact) continue;
        flags.push({
          code: 'heat-contact',
          severity: 'blocker',
          message: `The route runs into heat zone ${labels.get(zone.zoneId) ?? zone.zoneId}.`,
          target: lineTarget(line.line.id),
          fix: 'Reroute the line outside the zone, keeping the shop’s clearance, or shield the hot part.',
        });
      }
    }
    return flags;
  },
};
