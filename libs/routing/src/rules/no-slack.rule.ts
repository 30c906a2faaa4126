import { formatInches } from '../units/length-format.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';

export const noSlackRule: Rule = {
  code: 'no-slack',
  severity: 'caution',
  title: 'Too little slack across mounts',
  description:
    'A line between parts on different mounts (engine/transmission and chassis) moves as the engine rocks, and hose may shorten up to 4 % under pressure (FAA AC 43.13-1B): it needs the shop’s slack.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const { crossesMounts, slackIn } = line.report;
      if (!crossesMounts || slackIn >= line.requiredSlackIn - 1e-9) continue;
      flags.push({
        code: 'no-slack',
        severity: 'caution',
        message: `The line joins ${line.from?.unit.mountGroup} and ${line.to?.unit.mountGroup} mounts with ${formatInches(slackIn)} in of slack; the shop asks for ${formatInches(line.requiredSlackIn)} in.`,
        target: lineTarget(line.line.id),
        fix: 'Remove the slack override or raise it to the shop’s slack.',
      });
    }
    return flags;
  },
};
