import { describe, expect, it } from 'vitest';
import { coolerSketch } from '../test-support/sketch-fixtures';
import { moveCorner } from './commands/move-corner';
import { moveSelection } from './commands/move-selection';
import { dragFootprint, previewDocument, type DragPreview } from './drag-preview';
import { createEditorStore } from './editor-store';
import { canUndo } from './history';

const unitDrag = (dx: number, dy: number): DragPreview => ({
  label: 'Move unit',
  target: { kind: 'selection', selection: [{ kind: 'unit', id: 'trans' }] },
  dx,
  dy,
});

describe('drag preview', () => {
  it('previews exactly the document the drop leaves, and shares every untouched item', () => {
    const doc = coolerSketch();
    const drag = unitDrag(25, -10);
    const shown = previewDocument(doc, drag);
    expect(shown).toEqual(moveSelection(doc, { selection: [{ kind: 'unit', id: 'trans' }], dx: 25, dy: -10 }));
    expect(shown.units[1]).toBe(doc.units[1]); // the cooler did not move
    const both = previewDocument(doc, { ...drag, target: { kind: 'selection', selection: [{ kind: 'unit', id: 'trans' }, { kind: 'unit', id: 'cooler' }] } });
    expect(both.lines[0].points[0]).toMatchObject({ x: 455, y: 110 }); // both ends moved: the corner comes along
    const corner = previewDocument(doc, { label: 'Move corner', target: { kind: 'corner', lineId: 'return-line', index: 0, from: { x: 430, y: 120 } }, dx: 5, dy: 7 });
    expect(corner).toEqual(moveCorner(doc, { lineId: 'return-line', index: 0, x: 435, y: 127 }));
  });

  it('redraws the moved unit and every line that ends on it, nothing else', () => {
    const doc = coolerSketch();
    expect(dragFootprint(doc, unitDrag(0, 0).target)).toEqual({ units: new Set(['trans']), zones: new Set(), lines: new Set(['return-line']) });
  });

  it('leaves the document alone while the pointer moves and records one undo step on drop', () => {
    const store = createEditorStore(coolerSketch());
    const before = store.getState().history.doc;
    const drag = unitDrag(0, 0);
    store.startDrag(drag.label, drag.target);
    for (let i = 1; i <= 40; i++) store.dragTo(i, i / 2);
    expect(store.getState().history.doc).toBe(before);
    expect(canUndo(store.getState().history)).toBe(false);
    store.endDrag();
    const { history, drag: after } = store.getState();
    expect(after).toBeNull();
    expect(history.past.map((s) => s.label)).toEqual(['Move unit']);
    expect(history.doc.units[0]).toMatchObject({ x: 140, y: 120 });
    store.undo();
    expect(store.getState().history.doc).toEqual(before);
  });

  it('a drag that ends where it started leaves no undo step', () => {
    const store = createEditorStore(coolerSketch());
    const drag = unitDrag(0, 0);
    store.startDrag(drag.label, drag.target);
    store.dragTo(3, 0);
    store.dragTo(0, 0);
    store.endDrag();
    expect(canUndo(store.getState().history)).toBe(false);
  });
});
