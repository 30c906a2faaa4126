import { formatInches } from '../units/length-format.js';
import { isBelow } from './compare.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';
import type { ShopRules } from './shop-rules.js';

export const noSlackRule: Rule = {
  code: 'no-slack',
  severity: 'caution',
  title: 'Too little slack',
  description:
    'Hose may shorten up to 4 % under pressure (FAA AC 43.13-1B, ch. 9), so every line needs slack: the larger of the shop’s minimum for its mount case and the shop’s percentage of its length. A line between parts on different mounts (engine/transmission and chassis) also moves as the engine rocks, so its minimum is larger.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const { crossesMounts, slackIn, requiredSlackIn } = line.report;
      if (!isBelow(slackIn, requiredSlackIn)) continue;
      const mounts = crossesMounts
        ? `joins ${line.from?.unit.mountGroup} and ${line.to?.unit.mountGroup} mounts`
        : `has both ends on the ${line.from?.unit.mountGroup ?? 'same'} mount`;
      flags.push({
        code: 'no-slack',
        severity: 'caution',
        message: `The line ${mounts} and has ${formatInches(slackIn)} in of slack; the shop asks for ${formatInches(requiredSlackIn)} in (${slackWhy(requiredSlackIn, crossesMounts, ctx.rules)}).`,
        target: lineTarget(line.line.id),
        fix: 'Remove the slack override or raise it to the shop’s slack.',
      });
    }
    return flags;
  },
};

function slackWhy(requiredIn: number, crossesMounts: boolean, rules: ShopRules): string {
  const minimum = crossesMounts ? rules.slackMinIn : rules.slackMinSameMountIn;
  if (requiredIn > minimum) return `${rules.slackPercent} % of the length`;
  return crossesMounts ? 'its minimum across mounts' : 'its minimum on one mount';
}
