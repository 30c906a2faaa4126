import type { CircuitDocument, CircuitLine, CircuitUnit, HeatZone } from '../circuit/document.schema.js';
import type { CircuitEvaluation } from '../evaluate/evaluate-circuit.js';
import { portPosition } from '../lines/port-position.js';
import { sameValue } from './same-value.js';

/** A line whose path or length inputs changed; cut lengths are given when both evaluations are. */
export interface ReroutedLine {
  lineId: string;
  /** Cut length before and after, in inches; null where that side cannot be worked out (no scale). */
  oldCutLengthIn?: number | null;
  newCutLengthIn?: number | null;
}

/** Where on a line the parts changed: the hose, or the end stack at its from or to port. */
export type PartSlot = 'hose' | 'end-from' | 'end-to';

export interface PartsSwap {
  lineId: string;
  slot: PartSlot;
  /** Part ids in order (an end stack runs from the port outward); empty where there was none. */
  oldPartIds: string[];
  newPartIds: string[];
}

export interface LineItemChanges {
  lineId: string;
  added: string[];
  removed: string[];
  /** Same id, other position or length (supports: `atIn`; sleeves: interval or part). */
  changed: string[];
}

/** What changed between two circuit documents, item by item (for "what changed since the last sign-off"). */
export interface DocumentComparison {
  /** Circuit-wide fields that changed: `fluid`, `maxPressurePsi`, `maxTempF`, `calibration`, `background`. */
  settings: string[];
  units: { added: string[]; removed: string[]; moved: string[]; changed: string[] };
  lines: { added: string[]; removed: string[]; rerouted: ReroutedLine[]; partsSwapped: PartsSwap[] };
  heatZones: { added: string[]; removed: string[]; changed: string[] };
  /** Per line present on both sides; lines without support changes are left out. */
  supports: LineItemChanges[];
  sleeves: LineItemChanges[];
  /** Every unit, line and heat zone id touched by any change above, sorted (for highlighting). */
  changedIds: string[];
}

interface IdDiff<T> {
  added: string[];
  removed: string[];
  /** Items on both sides, as [before, after]. */
  kept: Array<[T, T]>;
}

function diffById<T extends { id: string }>(before: readonly T[], after: readonly T[]): IdDiff<T> {
  const beforeById = new Map(before.map((item) => [item.id, item]));
  const afterIds = new Set(after.map((item) => item.id));
  return {
    added: after.filter((item) => !beforeById.has(item.id)).map((item) => item.id),
    removed: before.filter((item) => !afterIds.has(item.id)).map((item) => item.id),
    kept: after.filter((item) => beforeById.has(item.id)).map((item) => [beforeById.get(item.id)!, item]),
  };
}

function unitMoved(a: CircuitUnit, b: CircuitUnit): boolean {
  return a.x !== b.x || a.y !== b.y || a.rotation !== b.rotation;
}

/** Anything but the placement changed: kind, label, mount group, ports … */
function unitChanged(a: CircuitUnit, b: CircuitUnit): boolean {
  const unplaced = (unit: CircuitUnit) => ({ ...unit, x: 0, y: 0, rotation: 0 });
  return !sameValue(unplaced(a), unplaced(b));
}

/** The sketch position of a line end, or null when its port does not exist on that side. */
function endPosition(doc: CircuitDocument, ref: CircuitLine['from']): { x: number; y: number } | null {
  const unit = doc.units.find((u) => u.id === ref.unitId);
  const port = unit?.ports.find((p) => p.id === ref.portId);
  return unit && port ? portPosition(unit, port) : null;
}

/** The path or a length input changed: corners, ports or where they sit, measured length, slack. */
function pathChanged(a: CircuitLine, b: CircuitLine, before: CircuitDocument, after: CircuitDocument): boolean {
  return (
    !sameValue(a.points, b.points) ||
    !sameValue(a.from, b.from) ||
    !sameValue(a.to, b.to) ||
    !sameValue(endPosition(before, a.from), endPosition(after, b.from)) ||
    !sameValue(endPosition(before, a.to), endPosition(after, b.to)) ||
    (a.measuredLengthIn ?? null) !== (b.measuredLengthIn ?? null) ||
    (a.slackOverrideIn ?? null) !== (b.slackOverrideIn ?? null)
  );
}

function partSwaps(a: CircuitLine, b: CircuitLine): PartsSwap[] {
  const slots: Array<[PartSlot, string[], string[]]> = [
    ['hose', a.hosePartId ? [a.hosePartId] : [], b.hosePartId ? [b.hosePartId] : []],
    ['end-from', a.endStacks.from, b.endStacks.from],
    ['end-to', a.endStacks.to, b.endStacks.to],
  ];
  return slots
    .filter(([, oldIds, newIds]) => !sameValue(oldIds, newIds))
    .map(([slot, oldPartIds, newPartIds]) => ({ lineId: b.id, slot, oldPartIds: [...oldPartIds], newPartIds: [...newPartIds] }));
}

function itemChanges<T extends { id: string }>(lineId: string, before: readonly T[], after: readonly T[]): LineItemChanges | null {
  const diff = diffById(before, after);
  const changed = diff.kept.filter(([a, b]) => !sameValue(a, b)).map(([, b]) => b.id);
  if (!diff.added.length && !diff.removed.length && !changed.length) return null;
  return { lineId, added: diff.added, removed: diff.removed, changed };
}

function cutLengthOf(evaluation: CircuitEvaluation, lineId: string): number | null {
  return evaluation.lines.find((line) => line.lineId === lineId)?.cutLengthIn ?? null;
}

function settingsChanges(before: CircuitDocument, after: CircuitDocument): string[] {
  const changed = (['fluid', 'maxPressurePsi', 'maxTempF'] as const).filter((key) => before.circuit[key] !== after.circuit[key]);
  const whole = (['calibration', 'background'] as const).filter((key) => !sameValue(before[key], after[key]));
  return [...changed, ...whole];
}

/**
 * Compares two circuit documents by item id. A line counts as re-routed when its corners, its
 * ports (or where those ports sit), its measured length or its slack changed — or, with both
 * evaluations given, when its cut length changed for any other reason (a new calibration).
 */
export function compareDocuments(
  before: CircuitDocument,
  after: CircuitDocument,
  evalBefore?: CircuitEvaluation,
  evalAfter?: CircuitEvaluation,
): DocumentComparison {
  const units = diffById(before.units, after.units);
  const lines = diffById(before.lines, after.lines);
  const zones = diffById<HeatZone>(before.heatZones, after.heatZones);
  const withCuts = evalBefore !== undefined && evalAfter !== undefined;

  const rerouted: ReroutedLine[] = [];
  const partsSwapped: PartsSwap[] = [];
  const supports: LineItemChanges[] = [];
  const sleeves: LineItemChanges[] = [];
  const otherLineChanges: string[] = [];
  for (const [a, b] of lines.kept) {
    const oldCut = withCuts ? cutLengthOf(evalBefore, a.id) : null;
    const newCut = withCuts ? cutLengthOf(evalAfter, b.id) : null;
    if (pathChanged(a, b, before, after) || oldCut !== newCut) {
      rerouted.push(withCuts ? { lineId: b.id, oldCutLengthIn: oldCut, newCutLengthIn: newCut } : { lineId: b.id });
    }
    partsSwapped.push(...partSwaps(a, b));
    const supportChanges = itemChanges(b.id, a.supports, b.supports);
    if (supportChanges) supports.push(supportChanges);
    const sleeveChanges = itemChanges(b.id, a.sleeves, b.sleeves);
    if (sleeveChanges) sleeves.push(sleeveChanges);
    if (!sameValue(a, b)) otherLineChanges.push(b.id);
  }

  const comparison: Omit<DocumentComparison, 'changedIds'> = {
    settings: settingsChanges(before, after),
    units: {
      added: units.added,
      removed: units.removed,
      moved: units.kept.filter(([a, b]) => unitMoved(a, b)).map(([, b]) => b.id),
      changed: units.kept.filter(([a, b]) => unitChanged(a, b)).map(([, b]) => b.id),
    },
    lines: { added: lines.added, removed: lines.removed, rerouted, partsSwapped },
    heatZones: {
      added: zones.added,
      removed: zones.removed,
      changed: zones.kept.filter(([a, b]) => !sameValue(a, b)).map(([, b]) => b.id),
    },
    supports,
    sleeves,
  };
  const changedIds = new Set([
    ...Object.values(comparison.units).flat(),
    ...comparison.lines.added,
    ...comparison.lines.removed,
    ...rerouted.map((line) => line.lineId),
    ...otherLineChanges,
    ...Object.values(comparison.heatZones).flat(),
  ]);
  return { ...comparison, changedIds: [...changedIds].sort() };
}
