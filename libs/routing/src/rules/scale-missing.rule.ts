import type { Rule } from './rule.js';

export const scaleMissingRule: Rule = {
  code: 'scale-missing',
  severity: 'blocker',
  title: 'No scale',
  description:
    'Without a calibrated scale the drawn lengths mean nothing: calibrate the sketch, or enter a measured length on every line.',
  check(ctx) {
    if (ctx.pxPerIn !== null) return [];
    const unmeasured = ctx.lines.filter((l) => l.report.measuredLengthIn === null);
    if (unmeasured.length === 0) return [];
    return [
      {
        code: 'scale-missing',
        severity: 'blocker',
        message: `The sketch has no scale, so ${unmeasured.length} line${unmeasured.length > 1 ? 's have' : ' has'} no length (${unmeasured.map((l) => l.line.id).join(', ')}).`,
        target: { kind: 'circuit', id: 'circuit' },
        fix: 'Calibrate: click two points a known distance apart and type the distance, or enter measured lengths.',
      },
    ];
  },
};
