import { formatInches } from '../units/length-format.js';
import { isAbove, isBelow } from './compare.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';

export const measuredLengthRule: Rule = {
  code: 'measured-length',
  severity: 'caution',
  title: 'Measured length does not match the sketch',
  description:
    'A measured length overrides the drawn one, so a slip of the tape or a typing error goes straight into the cut. A real path can never be shorter than the straight distance between its ports: a measured length well under it (the shop’s shortfall allowance covers photo perspective) is a caution. One far longer than the drawn route is a note to check it.',
  check(ctx) {
    const flags: Flag[] = [];
    const shortfall = ctx.rules.measuredShortfallPercent / 100;
    const excess = ctx.rules.measuredExcessPercent / 100;
    for (const line of ctx.lines) {
      const measured = line.report.measuredLengthIn;
      const detail = line.centreline;
      if (measured === null || !detail || detail.points.length < 2) continue;
      const a = detail.points[0];
      const b = detail.points[detail.points.length - 1];
      const straightIn = Math.hypot(b.x - a.x, b.y - a.y);
      const drawnIn = line.report.centrelineIn ?? straightIn;
      if (isBelow(measured, straightIn * (1 - shortfall))) {
        flags.push({
          code: 'measured-length',
          severity: 'caution',
          message: `The measured ${formatInches(measured)} in is shorter than the ${formatInches(straightIn)} in straight between the ports on the sketch (drawn route ${formatInches(drawnIn)} in): the measurement, the scale or a port position is wrong.`,
          target: lineTarget(line.line.id),
          fix: 'Measure the real path again, check the calibration, or clear the measured length to use the drawing.',
        });
      } else if (isAbove(measured, drawnIn * (1 + excess))) {
        flags.push({
          code: 'measured-length',
          severity: 'note',
          message: `The measured ${formatInches(measured)} in is more than ${Math.round(100 * (1 + excess)) / 100} times the drawn ${formatInches(drawnIn)} in: check it was typed in inches.`,
          target: lineTarget(line.line.id),
          fix: 'Confirm the measured length, or clear it to use the drawing.',
        });
      }
    }
    return flags;
  },
};
