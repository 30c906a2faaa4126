import type { Flag } from './flag.js';
import { endName, jointTarget, partName, type Rule } from './rule.js';

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
      const hose = line.hose;
      if (!hose) continue;
      const limit = ratio * hose.attributes.idIn;
      // One flag per restricting part, pointing at its place in the end stack, so each gets its
      // own acknowledgement (flagKey) and the sketch can show where it is.
      for (const end of ['from', 'to'] as const) {
        const items = line.stacks[end].items;
        for (let index = 0; index < items.length; index++) {
          const part = items[index].part;
          if (!part || (part.kind !== 'hose-end' && part.kind !== 'adapter' && part.kind !== 'bulkhead')) continue;
          if (part.attributes.boreIn >= limit) continue;
          flags.push({
            code: 'restriction',
            severity: 'caution',
            message: `At ${endName(line, end)}, ${partName(part)} has a ${part.attributes.boreIn} in bore, under ${Math.round(ratio * 100)} % of the hose's ${hose.attributes.idIn} in inside diameter.`,
            target: jointTarget(line.line.id, end, index),
            fix: 'Choose a full-flow fitting or the next size up.',
          });
        }
      }
    }
    return flags;
  },
};
