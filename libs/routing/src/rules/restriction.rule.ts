import { isBelow } from './compare.js';
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
          if (!isBelow(part.attributes.boreIn, limit)) continue; // 0.8 × 0.375 in is 0.300…04: a 0.300 in bore meets it
          flags.push({
            code: 'restriction',
            severity: 'caution',
            message: `At ${endName(line, end)}, ${partName(part)} has a ${part.attributes.boreIn} in bore, under ${Math.round(ratio * 1000) / 10} % of the hose's ${hose.attributes.idIn} in inside diameter (${Number(limit.toFixed(4))} in).`,
            target: jointTarget(line.line.id, end, index),
            fix: 'Choose a full-flow fitting or the next size up.',
          });
        }
      }
    }
    return flags;
  },
};
