import type { CircuitDocument } from '@linesmith/routing';
import { useCallback, useEffect, useRef, useState } from 'react';
import { ApiError } from '../../../lib/api-error';
import type { CircuitDraft } from '../../circuits/api/draft-schema';
import { DraftConflictError } from '../api/save-draft';
import type { EditorStore } from '../model/editor-store';
import { useEditorState } from './useEditorState';

/** Quiet time after the last change before the draft is saved. */
export const AUTOSAVE_DELAY_MS = 1000;
/** Retries after a failed save wait 2 s, 4 s, 8 s … up to this. */
export const MAX_RETRY_MS = 30_000;
export const KEPT_BEFORE_OVERWRITE = 'Kept before overwrite';

export type SaveStatus =
  | { state: 'saved' }
  | { state: 'unsaved' }
  | { state: 'saving' }
  | { state: 'offline'; retryInMs: number }
  | { state: 'conflict'; current: CircuitDraft }
  | { state: 'error'; message: string };

export interface DraftSaver {
  save(version: number, document: CircuitDocument): Promise<number>;
  snapshotServerDraft(message: string): Promise<unknown>;
  onSaved?(document: CircuitDocument, version: number): void;
}

export interface DraftAutosave {
  status: SaveStatus;
  version: number;
  /** Saves now (before "Save version"); resolves when the server has the document. */
  flush(): Promise<boolean>;
  loadServerDraft(): void;
  keepMine(): Promise<void>;
}

/**
 * Saves the editor's document about a second after the last change, compare-and-set on the draft
 * version. A failed request (offline) retries with backoff; a 409 stops saving until the user
 * chooses: load the server's draft, or keep theirs — after the server's draft is kept as a revision.
 */
export function useDraftAutosave(store: EditorStore, initialVersion: number, saver: DraftSaver): DraftAutosave {
  const doc = useEditorState(store, (s) => s.history.doc);
  const [status, setStatus] = useState<SaveStatus>({ state: 'saved' });
  const version = useRef(initialVersion);
  const saved = useRef<CircuitDocument>(doc);
  const inFlight = useRef<Promise<boolean> | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const failures = useRef(0);
  /** The document a save refused (e.g. 400): not sent again until it changes. */
  const refused = useRef<CircuitDocument | null>(null);
  const statusRef = useRef(status);
  statusRef.current = status;
  const saverRef = useRef(saver);
  saverRef.current = saver;

  const clearTimer = () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
  };

  const saveLatest = useCallback((): Promise<boolean> => {
    if (inFlight.current) return inFlight.current;
    const sending = store.getState().history.doc;
    if (sending === saved.current) {
      setStatus({ state: 'saved' });
      return Promise.resolve(true);
    }
    setStatus({ state: 'saving' });
    const run = saverRef.current
      .save(version.current, sending)
      .then((next) => {
        version.current = next;
        saved.current = sending;
        failures.current = 0;
        saverRef.current.onSaved?.(sending, next);
        const changedMeanwhile = store.getState().history.doc !== sending;
        setStatus({ state: changedMeanwhile ? 'unsaved' : 'saved' });
        return true;
      })
      .catch((error: unknown) => {
        if (error instanceof DraftConflictError) {
          setStatus({ state: 'conflict', current: error.current });
        } else if (error instanceof ApiError && (error.status === 0 || error.status >= 500)) {
          failures.current += 1;
          const retryInMs = Math.min(MAX_RETRY_MS, 1000 * 2 ** failures.current);
          setStatus({ state: 'offline', retryInMs });
        } else {
          refused.current = sending;
          setStatus({ state: 'error', message: error instanceof Error ? error.message : String(error) });
        }
        return false;
      })
      .finally(() => {
        inFlight.current = null;
      });
    inFlight.current = run;
    return run;
  }, [store]);

  // A change schedules a save; a save that ends with newer changes pending schedules the next.
  useEffect(() => {
    const state = statusRef.current.state;
    if (state === 'conflict' || state === 'saving' || state === 'offline') return;
    if (doc === saved.current || doc === refused.current) return;
    if (state !== 'unsaved') setStatus({ state: 'unsaved' });
    clearTimer();
    timer.current = setTimeout(() => void saveLatest(), AUTOSAVE_DELAY_MS);
    return clearTimer;
  }, [doc, status, saveLatest]);

  // Offline: try again after the backoff.
  useEffect(() => {
    if (status.state !== 'offline') return;
    const retry = setTimeout(() => void saveLatest(), status.retryInMs);
    return () => clearTimeout(retry);
  }, [status, saveLatest]);

  // Leaving with unsaved changes asks first.
  useEffect(() => {
    const dirty = status.state !== 'saved' || doc !== saved.current;
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = '';
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [status, doc]);

  const flush = useCallback(async () => {
    clearTimer();
    if (inFlight.current) await inFlight.current;
    return saveLatest();
  }, [saveLatest]);

  const loadServerDraft = useCallback(() => {
    const s = statusRef.current;
    if (s.state !== 'conflict') return;
    version.current = s.current.draftVersion;
    saved.current = s.current.document;
    store.replaceDocument(s.current.document);
    setStatus({ state: 'saved' });
  }, [store]);

  const keepMine = useCallback(async () => {
    const s = statusRef.current;
    if (s.state !== 'conflict') return;
    setStatus({ state: 'saving' });
    try {
      await saverRef.current.snapshotServerDraft(KEPT_BEFORE_OVERWRITE);
    } catch (error) {
      setStatus({ state: 'error', message: `The server's draft could not be kept as a version: ${error instanceof Error ? error.message : String(error)}` });
      return;
    }
    version.current = s.current.draftVersion;
    saved.current = s.current.document;
    await saveLatest();
  }, [saveLatest]);

  return { status, version: version.current, flush, loadServerDraft, keepMine };
}
