import { useEffect } from 'react';
import { isTyping } from '../components/SketchCanvas';
import { deleteSelection } from '../model/commands/delete-selection';
import { duplicateSelection } from '../model/commands/duplicate-selection';
import type { EditorStore } from '../model/editor-store';
import type { SelectedItem } from '../model/selection';
import { tools } from '../model/tools';

export interface ShortcutActions {
  fit(): void;
  zoomBy(factor: number): void;
  openHelp(): void;
}

/** The editor's keys (listed in the help dialog); ignored while typing in a field or with a dialog open. */
export function useEditorShortcuts(store: EditorStore, actions: ShortcutActions): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (isTyping(e) || document.querySelector('[role="dialog"], [role="alertdialog"]')) return;
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      const state = store.getState();
      if (mod && key === 'z') {
        e.preventDefault();
        if (e.shiftKey) store.redo();
        else store.undo();
        return;
      }
      if (mod && key === 'y') {
        e.preventDefault();
        store.redo();
        return;
      }
      if (mod && key === 'd') {
        e.preventDefault();
        const idMap = new Map<string, string>();
        store.run(duplicateSelection, { selection: state.selection, idMap });
        const copies: SelectedItem[] = state.selection.flatMap((s): SelectedItem[] => {
          if (s.kind === 'unit' || s.kind === 'line' || s.kind === 'zone') {
            const id = idMap.get(s.id);
            return id ? [{ kind: s.kind, id }] : [];
          }
          return [];
        });
        if (copies.length > 0) store.select(copies);
        return;
      }
      if (mod || e.altKey) return;
      if (e.key === 'Delete' || e.key === 'Backspace') {
        if (state.selection.length > 0) {
          e.preventDefault();
          store.run(deleteSelection, { selection: state.selection });
          store.select([]);
        }
        return;
      }
      if (e.key === 'Escape') {
        if (state.toolDraft) store.setToolDraft(null);
        else store.select([]);
        return;
      }
      if (e.key === '?') return actions.openHelp();
      if (e.key === '+' || e.key === '=') return actions.zoomBy(1.25);
      if (e.key === '-' || e.key === '−') return actions.zoomBy(1 / 1.25);
      if (key === 'f') return actions.fit();
      const tool = tools.find((t) => t.key.toLowerCase() === key);
      if (tool) store.setTool(tool.id);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [store, actions]);
}
