import type { CircuitDocument } from '@linesmith/routing';
import type { Command } from './commands/command';
import { dropDrag, type DragPreview, type DragTarget } from './drag-preview';
import * as history from './history';
import { emptySelection, type Selection } from './selection';
import type { ToolDraft, ToolId } from './tools';
import { initialView, type View } from './view';

export interface EditorState {
  history: history.DocumentHistory;
  selection: Selection;
  tool: ToolId;
  toolDraft: ToolDraft | null;
  view: View;
  /** The drag in progress, drawn as a preview; the document changes when it is dropped. */
  drag: DragPreview | null;
}

/** The sketch editor's state container: the document with its history, plus selection, tool and view. */
export interface EditorStore {
  getState(): EditorState;
  subscribe(listener: () => void): () => void;
  run<A>(cmd: Command<A>, args: A): void;
  beginGesture(label: string): void;
  endGesture(): void;
  /** Starts a drag preview (pointer down and moved past the drag distance). */
  startDrag(label: string, target: DragTarget): void;
  /** The pointer's travel since the drag started, in sketch pixels. */
  dragTo(dx: number, dy: number): void;
  /** Drops the drag: one command, one undo step named after the drag (nothing when it ends where it started). */
  endDrag(): void;
  undo(): void;
  redo(): void;
  select(selection: Selection): void;
  setTool(tool: ToolId): void;
  setToolDraft(draft: ToolDraft | null): void;
  setView(view: View): void;
  /** Starts over from another document (the server's draft): history and selection are cleared. */
  replaceDocument(doc: CircuitDocument): void;
}

/** Keeps the selection pointing at things that exist after an undo or delete. */
function pruneSelection(doc: CircuitDocument, selection: Selection): Selection {
  const units = new Map(doc.units.map((u) => [u.id, u]));
  const lines = new Map(doc.lines.map((l) => [l.id, l]));
  const zones = new Set(doc.heatZones.map((z) => z.id));
  const kept = selection.filter((item) => {
    switch (item.kind) {
      case 'unit':
        return units.has(item.id);
      case 'port':
        return units.get(item.unitId)?.ports.some((p) => p.id === item.id) ?? false;
      case 'line':
        return lines.has(item.id);
      case 'corner':
        return (lines.get(item.lineId)?.points.length ?? 0) > item.index;
      case 'zone':
        return zones.has(item.id);
    }
  });
  return kept.length === selection.length ? selection : kept;
}

export function createEditorStore(doc: CircuitDocument, selection: Selection = emptySelection): EditorStore {
  let state: EditorState = { history: history.startHistory(doc), selection, tool: 'select', toolDraft: null, view: initialView, drag: null };
  const listeners = new Set<() => void>();
  const set = (next: Partial<EditorState>) => {
    state = { ...state, ...next };
    if (next.history) state.selection = pruneSelection(state.history.doc, state.selection);
    for (const listener of listeners) listener();
  };
  return {
    getState: () => state,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    run(cmd, args) {
      const next = history.execute(state.history, cmd, args);
      if (next !== state.history) set({ history: next });
    },
    beginGesture: (label) => set({ history: history.beginGesture(state.history, label) }),
    endGesture: () => set({ history: history.endGesture(state.history) }),
    startDrag: (label, target) => set({ drag: { label, target, dx: 0, dy: 0 } }),
    dragTo(dx, dy) {
      const drag = state.drag;
      if (drag && (drag.dx !== dx || drag.dy !== dy)) set({ drag: { ...drag, dx, dy } });
    },
    endDrag() {
      const drag = state.drag;
      if (!drag) return;
      const dropped = dropDrag(state.history, drag);
      set(dropped === state.history ? { drag: null } : { history: dropped, drag: null });
    },
    undo: () => set({ history: history.undo(state.history), toolDraft: null, drag: null }),
    redo: () => set({ history: history.redo(state.history), toolDraft: null, drag: null }),
    select: (next) => set({ selection: next }),
    setTool: (tool) => set({ tool, toolDraft: null }),
    setToolDraft: (toolDraft) => set({ toolDraft }),
    setView: (view) => set({ view }),
    replaceDocument: (next) => set({ history: history.startHistory(next), selection: emptySelection, toolDraft: null, drag: null }),
  };
}
