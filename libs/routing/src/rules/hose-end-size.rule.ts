import { hoseEndFitsHose } from '@linesmith/catalog';
import type { Flag } from './flag.js';
import { endName, jointTarget, partName, type Rule } from './rule.js';

export const hoseEndSizeRule: Rule = {
  code: 'hose-end-size',
  severity: 'blocker',
  title: 'Hose end does not fit the hose',
  description: 'A hose end is made for one hose size (dash) and hose construction; on another hose it will not hold or seal.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      if (!line.hose) continue;
      for (const end of ['from', 'to'] as const) {
        const hoseEnd = line.stacks[end].hoseEnd;
        if (!hoseEnd || hoseEndFitsHose(hoseEnd, line.hose)) continue;
        const { hoseDash, hoseTypes } = hoseEnd.attributes;
        const hose = line.hose.attributes;
        flags.push({
          code: 'hose-end-size',
          severity: 'blocker',
          message: `At ${endName(line, end)}, ${partName(hoseEnd)} is for -${hoseDash} ${hoseTypes.join('/')} hose; the line uses -${hose.dash} ${hose.hoseType}.`,
          target: jointTarget(line.line.id, end, line.stacks[end].items.length - 1),
          fix: `Pick a hose end made for -${hose.dash} ${hose.hoseType} hose.`,
        });
      }
    }
    return flags;
  },
};
