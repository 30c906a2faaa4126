import { formatInches } from '../units/length-format.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';

export const supportGapRule: Rule = {
  code: 'support-gap',
  severity: 'caution',
  title: 'Unsupported span too long',
  description:
    'A line must be clamped at least every so often (the shop’s support spacing); the ports count as supports. Long free spans chafe and fatigue the hose ends.',
  check(ctx) {
    const flags: Flag[] = [];
    const spacing = ctx.rules.supportSpacingIn;
    for (const line of ctx.lines) {
      const long = line.report.supports.spans.filter((s) => s.lengthIn > spacing + 1e-9);
      if (long.length === 0) continue;
      const all = line.report.supports.proposedAtIn;
      const shown = all.slice(0, 6).map((at) => formatInches(at));
      const proposed = all.length > shown.length ? `${shown.join(', ')} … (${all.length} in all)` : shown.join(', ');
      flags.push({
        code: 'support-gap',
        severity: 'caution',
        message: `${long.length} span${long.length > 1 ? 's' : ''} longer than ${formatInches(spacing)} in (longest ${formatInches(line.report.supports.longestSpanIn)} in).`,
        target: lineTarget(line.line.id),
        fix: `Add supports, for example at ${proposed} in from the from end.`,
      });
    }
    return flags;
  },
};
