import type { Rule } from './rule.js';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export const scaleMissingRule: Rule = {
  code: 'scale-missing',
  severity: 'blocker',
  title: 'No scale',
  description:
    'Without a calibrated scale the drawn lengths mean nothing: lines without a measured length get no cut length, and the heat-clearance and bend checks cannot run at all (they work on the drawn route). Calibrate the sketch; a measured length on every line only covers the lengths.',
  check(ctx) {
    if (ctx.pxPerIn !== null) return [];
    // A measured length gives the cut, but the heat and bend checks still need the drawn route in inches.
    const unmeasured = ctx.lines.filter((l) => l.report.measuredLengthIn === null).map((l) => l.line.id);
    const zones = ctx.doc.heatZones.length;
    // Any corner, sharp ones too: a sharp corner is a bend tighter than every hose allows.
    const bent = ctx.doc.lines.filter((l) => l.points.length > 0).map((l) => l.id);
    const unchecked: string[] = [];
    if (unmeasured.length > 0) {
      unchecked.push(`${plural(unmeasured.length, 'line has', 'lines have')} no length (${unmeasured.join(', ')})`);
    }
    if (zones > 0) unchecked.push(`the heat check could not run against ${plural(zones, 'heat zone', 'heat zones')}`);
    if (bent.length > 0) unchecked.push(`the bend check could not run on the corners of ${bent.join(', ')}`);
    if (unchecked.length === 0) return [];
    return [
      {
        code: 'scale-missing',
        severity: 'blocker',
        message: `The sketch has no scale, so ${unchecked.join('; ')}.`,
        target: { kind: 'circuit', id: 'circuit' },
        fix:
          unmeasured.length > 0 && zones === 0 && bent.length === 0
            ? 'Calibrate: click two points a known distance apart and type the distance, or enter measured lengths.'
            : 'Calibrate: click two points a known distance apart and type the distance (measured lengths do not let the heat and bend checks run).',
      },
    ];
  },
};
