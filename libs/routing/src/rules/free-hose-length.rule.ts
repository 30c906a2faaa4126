import { hoseFit } from '../lines/hose-fit.js';
import { formatInches } from '../units/length-format.js';
import { isBelow } from './compare.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';

export const freeHoseLengthRule: Rule = {
  code: 'free-hose-length',
  severity: 'caution',
  title: 'Too little free hose',
  description:
    'The hose between the two sockets (the line’s length plus slack, less the rigid fittings at both ends) must be at least the shop’s minimum free length: a stub of hose cannot flex or take up the shortening under pressure. When the fittings meet or overlap there is no hose at all, which is a blocker.',
  check(ctx) {
    const flags: Flag[] = [];
    const minIn = ctx.rules.minFreeHoseIn;
    for (const line of ctx.lines) {
      if (line.stacks.from.hoseEnd === undefined && line.stacks.to.hoseEnd === undefined) continue; // incomplete-line says so
      const fit = hoseFit(line, ctx.rules);
      const free = fit.freeHoseIn;
      if (free === null) continue;
      const terms = `${formatInches(line.report.basis === 'measured' ? (line.report.measuredLengthIn ?? 0) : (line.report.centrelineIn ?? 0))} in ${line.report.basis} + ${formatInches(line.report.slackIn)} in slack − ${formatInches(fit.from.rigidIn)} in and ${formatInches(fit.to.rigidIn)} in of rigid fitting`;
      if (!isBelow(0, free)) {
        flags.push({
          code: 'free-hose-length',
          severity: 'blocker',
          message: `No free hose is left between the sockets (${terms}): the fittings meet.`,
          target: lineTarget(line.line.id),
          fix: 'Join these ports with adapters alone, or move the units apart and reroute.',
        });
      } else if (isBelow(free, minIn)) {
        flags.push({
          code: 'free-hose-length',
          severity: 'caution',
          message: `Only ${formatInches(free)} in of free hose between the sockets (${terms}); the shop asks for at least ${formatInches(minIn)} in.`,
          target: lineTarget(line.line.id),
          fix: 'Lengthen the route, use shorter or angled fittings, or join the ports with a hard adapter or tube instead.',
        });
      }
    }
    return flags;
  },
};
