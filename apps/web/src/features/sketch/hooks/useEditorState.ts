import { useSyncExternalStore } from 'react';
import type { EditorState, EditorStore } from '../model/editor-store';

/** Subscribes a component to one slice of the editor state (keep selectors returning stable values). */
export function useEditorState<T>(store: EditorStore, select: (state: EditorState) => T): T {
  return useSyncExternalStore(store.subscribe, () => select(store.getState()), () => select(store.getState()));
}
