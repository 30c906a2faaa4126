import type { HeatZone, ShopRules } from '@linesmith/routing';
import { isSelected, type SelectedItem, type Selection } from '../model/selection';

/** A heat zone's clearance band in sketch pixels (null without calibration). */
export const zoneClearancePx = (zone: HeatZone, pxPerIn: number | null, rules: ShopRules): number | null =>
  pxPerIn ? pxPerIn * (zone.clearanceIn ?? rules.heatClearanceIn[zone.kind]) : null;

/** The selected port of a unit, if any. */
export const selectedPortOf = (selection: Selection, unitId: string): string | null =>
  selection.find((s): s is Extract<SelectedItem, { kind: 'port' }> => s.kind === 'port' && s.unitId === unitId)?.id ?? null;

/** A line shows its corner handles while it, or one of its corners, is selected. */
export const showsCornerHandles = (selection: Selection, lineId: string, cornerCount: number): boolean =>
  isSelected(selection, { kind: 'line', id: lineId }) ||
  Array.from({ length: cornerCount }, (_, index) => index).some((index) => isSelected(selection, { kind: 'corner', lineId, index }));
