import { formatInches } from '../units/length-format.js';
import { isAbove } from './compare.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';
import { supportSpacingFor } from './shop-rules.js';

export const supportGapRule: Rule = {
  code: 'support-gap',
  severity: 'caution',
  title: 'Unsupported span too long',
  description:
    'A line must be clamped at least every so often; the ports count as supports. The shop’s spacing grows with the hose size (a table by dash size, seeded from FAA AC 43.13-1B Table 9-3). Long free spans chafe and fatigue the hose ends.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const dash = line.hose?.attributes.dash;
      const spacing = supportSpacingFor(dash, ctx.rules);
      const long = line.report.supports.spans.filter((s) => isAbove(s.lengthIn, spacing));
      if (long.length === 0) continue;
      const all = line.report.supports.proposedAtIn;
      const shown = all.slice(0, 6).map((at) => formatInches(at));
      const proposed = all.length > shown.length ? `${shown.join(', ')} … (${all.length} in all)` : shown.join(', ');
      const size = dash !== undefined && ctx.rules.supportSpacingByDashIn[String(dash)] !== undefined ? ` (the shop’s spacing for -${dash})` : '';
      flags.push({
        code: 'support-gap',
        severity: 'caution',
        message: `${long.length} span${long.length > 1 ? 's' : ''} longer than ${formatInches(spacing)} in${size} (longest ${formatInches(line.report.supports.longestSpanIn)} in).`,
        target: lineTarget(line.line.id),
        fix: `Add supports, for example at ${proposed} in from the from end.`,
      });
    }
    return flags;
  },
};
