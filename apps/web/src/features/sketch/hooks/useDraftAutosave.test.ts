import { act, renderHook } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-error';
import { DraftConflictError } from '../api/save-draft';
import { moveUnit } from '../model/commands/move-unit';
import { createEditorStore } from '../model/editor-store';
import { coolerSketch } from '../test-support/sketch-fixtures';
import { AUTOSAVE_DELAY_MS, KEPT_BEFORE_OVERWRITE, useDraftAutosave, type DraftSaver } from './useDraftAutosave';

beforeEach(() => {
  vi.useFakeTimers();
});
afterEach(() => {
  vi.useRealTimers();
});

function setUp(save: DraftSaver['save']) {
  const store = createEditorStore(coolerSketch());
  const saver = { save: vi.fn(save), snapshotServerDraft: vi.fn(async () => ({})) };
  const hook = renderHook(() => useDraftAutosave(store, 4, saver));
  return { store, saver, hook };
}

const settle = async (ms: number) => {
  await act(async () => {
    await vi.advanceTimersByTimeAsync(ms);
  });
};

describe('draft autosave', () => {
  it('saves once, a second after the last of several changes, against the draft version', async () => {
    const { store, saver, hook } = setUp(async (version) => version + 1);
    act(() => store.run(moveUnit, { unitId: 'trans', x: 1, y: 1 }));
    await settle(500);
    act(() => store.run(moveUnit, { unitId: 'trans', x: 2, y: 2 }));
    expect(hook.result.current.status.state).toBe('unsaved');
    await settle(AUTOSAVE_DELAY_MS - 1);
    expect(saver.save).not.toHaveBeenCalled();
    await settle(1);
    expect(saver.save).toHaveBeenCalledTimes(1);
    expect(saver.save.mock.calls[0][0]).toBe(4);
    expect(saver.save.mock.calls[0][1].units[0].x).toBe(2);
    expect(hook.result.current.status.state).toBe('saved');
    expect(hook.result.current.version).toBe(5);
  });

  it('goes offline when the server cannot be reached and retries with backoff', async () => {
    let calls = 0;
    const { store, saver, hook } = setUp(async (version) => {
      calls += 1;
      if (calls === 1) throw new ApiError({ status: 0, code: 'network_error', message: 'offline' });
      return version + 1;
    });
    act(() => store.run(moveUnit, { unitId: 'trans', x: 1, y: 1 }));
    await settle(AUTOSAVE_DELAY_MS);
    expect(hook.result.current.status).toEqual({ state: 'offline', retryInMs: 2000 });
    await settle(2000);
    expect(saver.save).toHaveBeenCalledTimes(2);
    expect(hook.result.current.status.state).toBe('saved');
  });

  it('on a conflict, "keep mine" keeps the server draft as a revision first, then saves over its version', async () => {
    const server = { document: { ...coolerSketch(), heatZones: [] }, draftVersion: 9 };
    const { store, saver, hook } = setUp(async (version) => {
      if (version === 4) throw new DraftConflictError('stale', server);
      return version + 1;
    });
    act(() => store.run(moveUnit, { unitId: 'trans', x: 7, y: 7 }));
    await settle(AUTOSAVE_DELAY_MS);
    expect(hook.result.current.status.state).toBe('conflict');
    await act(async () => {
      await hook.result.current.keepMine();
    });
    expect(saver.snapshotServerDraft).toHaveBeenCalledWith(KEPT_BEFORE_OVERWRITE);
    expect(saver.snapshotServerDraft.mock.invocationCallOrder[0]).toBeLessThan(saver.save.mock.invocationCallOrder[1]);
    expect(saver.save.mock.calls[1][0]).toBe(9);
    expect(saver.save.mock.calls[1][1].units[0].x).toBe(7);
    expect(hook.result.current.version).toBe(10);
  });

  it('on a conflict, "load the server\'s draft" replaces the document and its history', async () => {
    const serverDoc = { ...coolerSketch(), lines: [] };
    const { store, hook } = setUp(async () => {
      throw new DraftConflictError('stale', { document: serverDoc, draftVersion: 12 });
    });
    act(() => store.run(moveUnit, { unitId: 'trans', x: 7, y: 7 }));
    await settle(AUTOSAVE_DELAY_MS);
    act(() => hook.result.current.loadServerDraft());
    expect(store.getState().history.doc).toBe(serverDoc);
    expect(store.getState().history.past).toHaveLength(0);
    expect(hook.result.current.status.state).toBe('saved');
  });
});
