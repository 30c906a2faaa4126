import { formatInches } from '../units/length-format.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';

export const heatSleeveRule: Rule = {
  code: 'heat-sleeve',
  severity: 'caution',
  title: 'Near heat without a sleeve',
  description:
    'Where a route passes within the shop’s clearance of a heat zone, that stretch needs a fire sleeve, running past each end by the shop’s overlap.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const uncovered = line.report.sleeves.uncoveredIn;
      if (uncovered.length === 0) continue;
      const stretches = uncovered.map((i) => `${formatInches(i.start)}–${formatInches(i.end)} in`).join(', ');
      const planned = line.report.sleeves.plannedIn.map((i) => `${formatInches(i.start)}–${formatInches(i.end)} in`).join(', ');
      flags.push({
        code: 'heat-sleeve',
        severity: 'caution',
        message: `Unsleeved near heat at ${stretches} from the ${line.from?.port.label || 'from'} end.`,
        target: lineTarget(line.line.id),
        fix: `Add a fire sleeve over ${planned}, or reroute further from the heat.`,
      });
    }
    return flags;
  },
};
