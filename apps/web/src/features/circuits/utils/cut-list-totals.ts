import type { LineReportView } from '../api/check-schema';

export interface CutListTotals {
  lines: number;
  /** Lines whose cut length is known (calibrated or measured). */
  cutLines: number;
  totalCutIn: number;
  sleeveIn: number;
  supports: number;
}

export function cutListTotals(lines: readonly LineReportView[]): CutListTotals {
  let totalCutIn = 0;
  let cutLines = 0;
  let sleeveIn = 0;
  let supports = 0;
  for (const line of lines) {
    if (line.cutLengthIn !== null) {
      totalCutIn += line.cutLengthIn;
      cutLines += 1;
    }
    sleeveIn += line.sleeves.plannedLengthIn;
    supports += line.supports.atIn.length;
  }
  return { lines: lines.length, cutLines, totalCutIn, sleeveIn, supports };
}
