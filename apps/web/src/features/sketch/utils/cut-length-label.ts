import { formatCutLength, type LengthUnit, type LineReport } from '@linesmith/routing';

/** The dimension label a line carries on the sketch: its cut length, rounded up (or why there is none). */
export function cutLengthLabel(report: LineReport | undefined, unit: LengthUnit): string {
  if (!report || report.basis === null) return 'Cut: needs scale or measured length';
  if (report.cutLengthIn === null) return 'Cut: end stacks longer than the line';
  const measured = report.basis === 'measured' ? ' (measured)' : '';
  return `Cut ${formatCutLength(report.cutLengthIn, unit)}${measured}`;
}
