import { circuitDocumentSchema, type CircuitDocument } from '@linesmith/routing';
import { describe, expect, it } from 'vitest';
import { coolerSketch } from '../../test-support/sketch-fixtures';
import { execute, startHistory, undo, redo } from '../history';
import type { Command } from './command';
import { addCorner } from './add-corner';
import { addHeatZone } from './add-heat-zone';
import { addLine } from './add-line';
import { addPort } from './add-port';
import { addSleeve } from './add-sleeve';
import { addSupport } from './add-support';
import { addUnit } from './add-unit';
import { calibrate } from './calibrate';
import { deleteHeatZone } from './delete-heat-zone';
import { deleteLine } from './delete-line';
import { deletePort } from './delete-port';
import { deleteSelection } from './delete-selection';
import { deleteUnit } from './delete-unit';
import { duplicateSelection } from './duplicate-selection';
import { moveCorner } from './move-corner';
import { moveSelection } from './move-selection';
import { moveUnit } from './move-unit';
import { proposeSupports } from './propose-supports';
import { removeCorner } from './remove-corner';
import { removeSleeve } from './remove-sleeve';
import { removeSupport } from './remove-support';
import { rotateUnit } from './rotate-unit';
import { setBackground } from './set-background';
import { setBendRadius } from './set-bend-radius';
import { setConnectionSpec } from './set-connection-spec';
import { setEndStack } from './set-end-stack';
import { setHose } from './set-hose';
import { setMeasuredLength } from './set-measured-length';
import { sleeveRequiredSpans } from './sleeve-required-spans';
import { updateHeatZone } from './update-heat-zone';
import { updatePort } from './update-port';
import { updateUnit } from './update-unit';

const zone = [
  { x: 200, y: 200 },
  { x: 260, y: 200 },
  { x: 260, y: 260 },
];
const withZone = () => addHeatZone(coolerSketch(), { polygon: zone, id: 'z1' });

const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/g;
const maskFreshIds = (doc: CircuitDocument): unknown => JSON.parse(JSON.stringify(doc).replace(UUID, 'fresh-id'));

/** Runs the command through history, checks the result is a valid document, and that undo restores the original exactly. */
function runAndUndo<A>(doc: CircuitDocument, cmd: Command<A>, args: A): CircuitDocument {
  const after = execute(startHistory(doc), cmd, args);
  expect(after.doc).not.toBe(doc);
  expect(circuitDocumentSchema.safeParse(after.doc).success).toBe(true);
  expect(undo(after).doc).toEqual(doc);
  expect(redo(undo(after)).doc).toEqual(after.doc);
  // The pure form gives the same document (new items get fresh random ids, so those are masked).
  expect(maskFreshIds(cmd(doc, args))).toEqual(maskFreshIds(after.doc));
  return after.doc;
}

describe('sketch commands (each checked with its undo and redo)', () => {
  it('addUnit places a preset with its ports', () => {
    const doc = runAndUndo(coolerSketch(), addUnit, { kind: 'cooler', x: 10, y: 20, id: 'c2' });
    const unit = doc.units.find((u) => u.id === 'c2')!;
    expect(unit.ports.map((p) => p.connection)).toEqual([
      { family: 'invflare45', size: '3/8', gender: 'female' },
      { family: 'invflare45', size: '3/8', gender: 'female' },
    ]);
    expect(unit.mountGroup).toBe('chassis');
  });

  it('moveUnit, rotateUnit and updateUnit change the unit', () => {
    expect(runAndUndo(coolerSketch(), moveUnit, { unitId: 'trans', x: 5, y: 6 }).units[0]).toMatchObject({ x: 5, y: 6 });
    expect(runAndUndo(coolerSketch(), rotateUnit, { unitId: 'trans', rotation: -90 }).units[0].rotation).toBe(270);
    const doc = runAndUndo(coolerSketch(), updateUnit, { unitId: 'cooler', changes: { label: 'Stacked-plate cooler', mountGroup: 'axle' } });
    expect(doc.units[1]).toMatchObject({ label: 'Stacked-plate cooler', mountGroup: 'axle' });
  });

  it('deleteUnit removes the unit and its lines', () => {
    const doc = runAndUndo(coolerSketch(), deleteUnit, { unitId: 'cooler' });
    expect(doc.units.map((u) => u.id)).toEqual(['trans']);
    expect(doc.lines).toEqual([]);
  });

  it('addPort, updatePort, setConnectionSpec and deletePort edit ports', () => {
    expect(runAndUndo(coolerSketch(), addPort, { unitId: 'trans', id: 'p3' }).units[0].ports).toHaveLength(3);
    const edited = runAndUndo(coolerSketch(), updatePort, {
      unitId: 'trans',
      portId: 'ret',
      changes: { label: 'Return', requirement: null, feedsLubrication: false },
    });
    expect(edited.units[0].ports[1].requirement).toBeUndefined();
    expect(edited.units[0].ports[1].feedsLubrication).toBeUndefined();
    const spec = { family: 'npt', size: '1/4', gender: 'female' } as const;
    expect(runAndUndo(coolerSketch(), setConnectionSpec, { unitId: 'trans', portId: 'out', connection: spec }).units[0].ports[0].connection).toEqual(spec);
    const gone = runAndUndo(coolerSketch(), deletePort, { unitId: 'trans', portId: 'ret' });
    expect(gone.units[0].ports.map((p) => p.id)).toEqual(['out']);
    expect(gone.lines).toEqual([]);
  });

  it('updatePort sets and clears a port’s thread depth, passage depth and least reach (inches, more than 0)', () => {
    const deep = runAndUndo(coolerSketch(), updatePort, { unitId: 'trans', portId: 'ret', changes: { threadDepthIn: 1.2, passageDepthIn: 1.5, minReachIn: 0.9 } });
    expect(deep.units[0].ports[1]).toMatchObject({ threadDepthIn: 1.2, passageDepthIn: 1.5, minReachIn: 0.9 });
    expect(circuitDocumentSchema.safeParse(deep).success).toBe(true);
    const cleared = runAndUndo(deep, updatePort, { unitId: 'trans', portId: 'ret', changes: { passageDepthIn: null } });
    expect(cleared.units[0].ports[1].passageDepthIn).toBeUndefined();
    expect(() => updatePort(coolerSketch(), { unitId: 'trans', portId: 'ret', changes: { minReachIn: 0 } })).toThrow(RangeError);
  });

  it('addLine joins two free ports through the corners and refuses a taken port', () => {
    const doc = runAndUndo(coolerSketch(), addLine, {
      from: { unitId: 'trans', portId: 'out' },
      to: { unitId: 'cooler', portId: 'in' },
      corners: [{ x: 300, y: 80 }],
      id: 'feed',
    });
    expect(doc.lines[1]).toMatchObject({ id: 'feed', hosePartId: null, endStacks: { from: [], to: [] } });
    expect(doc.lines[1].points).toEqual([{ x: 300, y: 80, bendRadiusIn: 3 }]);
    expect(() => addLine(coolerSketch(), { from: { unitId: 'trans', portId: 'ret' }, to: { unitId: 'cooler', portId: 'in' }, corners: [] })).toThrow(RangeError);
    expect(() => addLine(coolerSketch(), { from: { unitId: 'trans', portId: 'out' }, to: { unitId: 'trans', portId: 'out' }, corners: [] })).toThrow(RangeError);
  });

  it('deleteLine removes a line', () => {
    expect(runAndUndo(coolerSketch(), deleteLine, { lineId: 'return-line' }).lines).toEqual([]);
  });

  it('corner commands insert, move, re-radius and remove corners', () => {
    const added = runAndUndo(coolerSketch(), addCorner, { lineId: 'return-line', index: 1, x: 430, y: 280 });
    expect(added.lines[0].points.map((p) => [p.x, p.y])).toEqual([[430, 120], [430, 280]]);
    expect(runAndUndo(coolerSketch(), moveCorner, { lineId: 'return-line', index: 0, x: 1, y: 2 }).lines[0].points[0]).toMatchObject({ x: 1, y: 2 });
    expect(runAndUndo(coolerSketch(), setBendRadius, { lineId: 'return-line', index: 0, bendRadiusIn: 4.5 }).lines[0].points[0].bendRadiusIn).toBe(4.5);
    expect(() => setBendRadius(coolerSketch(), { lineId: 'return-line', index: 0, bendRadiusIn: -1 })).toThrow(RangeError);
    expect(runAndUndo(coolerSketch(), removeCorner, { lineId: 'return-line', index: 0 }).lines[0].points).toEqual([]);
  });

  it('hose, end stack and measured length', () => {
    expect(runAndUndo(coolerSketch(), setHose, { lineId: 'return-line', hosePartId: null }).lines[0].hosePartId).toBeNull();
    const stack = ['demo-adapter-orb6-f37-6-long', 'demo-hose-end-6-rubber-90'];
    expect(runAndUndo(coolerSketch(), setEndStack, { lineId: 'return-line', end: 'from', partIds: stack }).lines[0].endStacks.from).toEqual(stack);
    expect(runAndUndo(coolerSketch(), setMeasuredLength, { lineId: 'return-line', measuredLengthIn: 23 + 11 / 16 }).lines[0].measuredLengthIn).toBe(23.6875);
    expect(() => setMeasuredLength(coolerSketch(), { lineId: 'return-line', measuredLengthIn: 0 })).toThrow(RangeError);
  });

  it('supports: add, remove, propose at the shop spacing', () => {
    const one = runAndUndo(coolerSketch(), addSupport, { lineId: 'return-line', atIn: 12, id: 's1' });
    expect(one.lines[0].supports).toEqual([{ id: 's1', atIn: 12 }]);
    expect(runAndUndo(one, removeSupport, { lineId: 'return-line', supportId: 's1' }).lines[0].supports).toEqual([]);
    // 40 in at 18 in spacing: 3 spans of 13-1/3 in (fewest spans no longer than the spacing).
    const proposed = runAndUndo(coolerSketch(), proposeSupports, { lineId: 'return-line', lengthIn: 40, spacingIn: 18 });
    expect(proposed.lines[0].supports.map((s) => s.atIn)).toEqual([40 / 3, 80 / 3]);
  });

  it('sleeves: add, remove, and sleeve the spans the evaluation asks for', () => {
    const one = runAndUndo(coolerSketch(), addSleeve, { lineId: 'return-line', startIn: 2, endIn: 9, id: 'v1' });
    expect(one.lines[0].sleeves).toEqual([{ id: 'v1', startIn: 2, endIn: 9, partId: null }]);
    expect(runAndUndo(one, removeSleeve, { lineId: 'return-line', sleeveId: 'v1' }).lines[0].sleeves).toEqual([]);
    const spans = runAndUndo(coolerSketch(), sleeveRequiredSpans, {
      lineId: 'return-line',
      plannedIn: [{ start: 3, end: 8 }, { start: 12, end: 20 }],
      partId: 'demo-sleeve-5-8',
    });
    expect(spans.lines[0].sleeves.map((s) => [s.startIn, s.endIn, s.partId])).toEqual([[3, 8, 'demo-sleeve-5-8'], [12, 20, 'demo-sleeve-5-8']]);
  });

  it('heat zones: add, edit, delete', () => {
    const doc = runAndUndo(coolerSketch(), addHeatZone, { polygon: zone, id: 'z1' });
    expect(doc.heatZones[0]).toMatchObject({ id: 'z1', kind: 'exhaust', label: 'Exhaust' });
    expect(() => addHeatZone(coolerSketch(), { polygon: zone.slice(0, 2) })).toThrow(RangeError);
    const edited = runAndUndo(withZone(), updateHeatZone, { zoneId: 'z1', changes: { kind: 'turbo', clearanceIn: 8, label: 'Turbo' } });
    expect(edited.heatZones[0]).toMatchObject({ kind: 'turbo', clearanceIn: 8, label: 'Turbo' });
    expect(runAndUndo(edited, updateHeatZone, { zoneId: 'z1', changes: { clearanceIn: null } }).heatZones[0].clearanceIn).toBeUndefined();
    const shielded = runAndUndo(edited, updateHeatZone, { zoneId: 'z1', changes: { shielded: true } });
    expect(shielded.heatZones[0].shielded).toBe(true);
    expect(runAndUndo(shielded, updateHeatZone, { zoneId: 'z1', changes: { shielded: false } }).heatZones[0].shielded).toBeUndefined();
    expect(runAndUndo(withZone(), deleteHeatZone, { zoneId: 'z1' }).heatZones).toEqual([]);
  });

  it('calibrate and setBackground', () => {
    const doc = runAndUndo(coolerSketch(), calibrate, { a: { x: 0, y: 0 }, b: { x: 0, y: 200 }, knownIn: 10 });
    expect(doc.calibration).toEqual({ a: { x: 0, y: 0 }, b: { x: 0, y: 200 }, knownIn: 10 });
    expect(() => calibrate(coolerSketch(), { a: { x: 1, y: 1 }, b: { x: 1, y: 1 }, knownIn: 10 })).toThrow(RangeError);
    expect(() => calibrate(coolerSketch(), { a: { x: 0, y: 0 }, b: { x: 1, y: 1 }, knownIn: 0 })).toThrow(RangeError);
    const bg = { uploadId: 'u1', opacity: 0.6, locked: true };
    expect(runAndUndo(coolerSketch(), setBackground, { background: bg }).background).toEqual(bg);
  });

  it('moveSelection moves units, zones, and the corners of lines between moved units', () => {
    const doc = runAndUndo(withZone(), moveSelection, {
      selection: [{ kind: 'unit', id: 'trans' }, { kind: 'unit', id: 'cooler' }, { kind: 'zone', id: 'z1' }],
      dx: 10,
      dy: -5,
    });
    expect(doc.units.map((u) => [u.x, u.y])).toEqual([[110, 95], [510, 295]]);
    expect(doc.lines[0].points[0]).toMatchObject({ x: 440, y: 115 });
    expect(doc.heatZones[0].polygon[0]).toEqual({ x: 210, y: 195 });
    // One unit alone: the line's corners stay where the fabricator put them.
    expect(moveSelection(coolerSketch(), { selection: [{ kind: 'unit', id: 'trans' }], dx: 10, dy: 0 }).lines[0].points[0].x).toBe(430);
  });

  it('deleteSelection removes units with their lines, corners and zones', () => {
    const doc = runAndUndo(withZone(), deleteSelection, { selection: [{ kind: 'corner', lineId: 'return-line', index: 0 }, { kind: 'zone', id: 'z1' }] });
    expect(doc.lines[0].points).toEqual([]);
    expect(doc.heatZones).toEqual([]);
    expect(runAndUndo(coolerSketch(), deleteSelection, { selection: [{ kind: 'unit', id: 'trans' }] }).lines).toEqual([]);
  });

  it('duplicateSelection copies units with fresh ids and the lines between them', () => {
    const selection = [{ kind: 'unit', id: 'trans' }, { kind: 'unit', id: 'cooler' }, { kind: 'zone', id: 'z1' }] as const;
    runAndUndo(withZone(), duplicateSelection, { selection });
    const idMap = new Map<string, string>();
    const doc = duplicateSelection(withZone(), { selection, idMap });
    expect(doc.units).toHaveLength(4);
    expect(doc.lines).toHaveLength(2);
    expect(doc.heatZones).toHaveLength(2);
    const copy = doc.lines[1];
    expect(copy.from.unitId).toBe(idMap.get('trans'));
    expect(copy.points[0]).toMatchObject({ x: 454, y: 144 });
    expect(new Set(doc.units.flatMap((u) => u.ports.map((p) => p.id))).size).toBe(8);
  });
});
