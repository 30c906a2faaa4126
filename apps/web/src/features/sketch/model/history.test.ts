import { describe, expect, it } from 'vitest';
import { coolerSketch } from '../test-support/sketch-fixtures';
import { moveCorner } from './commands/move-corner';
import { moveUnit } from './commands/move-unit';
import { createEditorStore } from './editor-store';
import { beginGesture, canRedo, canUndo, endGesture, execute, HISTORY_DEPTH, redo, startHistory, undo } from './history';

describe('undo history', () => {
  it('keeps at least 200 steps and drops the oldest past its depth', () => {
    expect(HISTORY_DEPTH).toBeGreaterThanOrEqual(200);
    let h = startHistory(coolerSketch());
    for (let i = 1; i <= HISTORY_DEPTH + 5; i++) h = execute(h, moveUnit, { unitId: 'trans', x: i, y: 0 });
    expect(h.past).toHaveLength(HISTORY_DEPTH);
    for (let i = 0; i < HISTORY_DEPTH; i++) h = undo(h);
    expect(canUndo(h)).toBe(false);
    expect(h.doc.units[0].x).toBe(5); // the first five moves fell off the end
  });

  it('groups a whole drag into one step', () => {
    const start = coolerSketch();
    let h = beginGesture(startHistory(start), 'Drag corner');
    for (let i = 1; i <= 30; i++) h = execute(h, moveCorner, { lineId: 'return-line', index: 0, x: 430 + i, y: 120 + i });
    h = endGesture(h);
    expect(h.past).toHaveLength(1);
    expect(h.doc.lines[0].points[0]).toMatchObject({ x: 460, y: 150 });
    const undone = undo(h);
    expect(undone.doc).toEqual(start);
    expect(canRedo(undone)).toBe(true);
    expect(redo(undone).doc.lines[0].points[0]).toMatchObject({ x: 460, y: 150 });
  });

  it('leaves no step for a click without a change, and a new command clears redo', () => {
    const h = endGesture(beginGesture(startHistory(coolerSketch()), 'Click'));
    expect(h.past).toHaveLength(0);
    const moved = undo(execute(h, moveUnit, { unitId: 'trans', x: 1, y: 1 }));
    expect(moved.future).toHaveLength(1);
    expect(execute(moved, moveUnit, { unitId: 'trans', x: 2, y: 2 }).future).toHaveLength(0);
  });

  it('the editor store drops a selection that an undo removed', () => {
    const store = createEditorStore(coolerSketch());
    store.run(moveUnit, { unitId: 'trans', x: 0, y: 0 });
    store.select([{ kind: 'corner', lineId: 'return-line', index: 0 }, { kind: 'unit', id: 'trans' }]);
    store.replaceDocument({ ...coolerSketch(), lines: [] });
    expect(store.getState().selection).toEqual([]);
    expect(canUndo(store.getState().history)).toBe(false);
  });
});
