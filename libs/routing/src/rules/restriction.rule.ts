import type { Flag } from './flag.js';
import { lineTarget, partName, type Rule } from './rule.js';

export const restrictionRule: Rule = {
  code: 'restriction',
  severity: 'caution',
  title: 'Bore restricts the flow',
  description:
    'A fitting or adapter whose bore is much smaller than the hose inside diameter (below the shop’s ratio, 80 % by default) chokes the flow and heats the fluid.',
  check(ctx) {
    const flags: Flag[] = [];
    const ratio = ctx.rules.restrictionRatio;
    for (const line of ctx.lines) {
      if (!line.hose) continue;
      const limit = ratio * line.hose.attributes.idIn;
      const seen = new Set<string>();
      for (const item of [...line.stacks.from.items, ...line.stacks.to.items]) {
        const part = item.part;
        if (!part || seen.has(part.id)) continue;
        seen.add(part.id);
        if (part.kind !== 'hose-end' && part.kind !== 'adapter' && part.kind !== 'bulkhead') continue;
        if (part.attributes.boreIn >= limit) continue;
        flags.push({
          code: 'restriction',
          severity: 'caution',
          message: `${partName(part)} has a ${part.attributes.boreIn} in bore, under ${Math.round(ratio * 100)} % of the hose's ${line.hose.attributes.idIn} in inside diameter.`,
          target: lineTarget(line.line.id),
          fix: 'Choose a full-flow fitting or the next size up.',
        });
      }
    }
    return flags;
  },
};
