import { applyPatches, enablePatches, produceWithPatches, type Patch } from 'immer';
import type { CircuitDocument } from '@linesmith/routing';
import type { Command } from './commands/command';

enablePatches();

/** How many steps undo reaches back. */
export const HISTORY_DEPTH = 500;

/** One undoable step: the patches of one command, or of every command of one gesture (a whole drag). */
export interface HistoryStep {
  label: string;
  patches: Patch[];
  inverse: Patch[];
}

export interface DocumentHistory {
  doc: CircuitDocument;
  past: readonly HistoryStep[];
  future: readonly HistoryStep[];
  /** Open while a gesture runs (pointer down … pointer up): its commands collect into one step. */
  gesture: HistoryStep | null;
}

export const startHistory = (doc: CircuitDocument): DocumentHistory => ({ doc, past: [], future: [], gesture: null });

const pushStep = (past: readonly HistoryStep[], step: HistoryStep): HistoryStep[] =>
  [...past, step].slice(-HISTORY_DEPTH);

/** Runs a command and records it: into the open gesture, or as a step of its own. */
export function execute<A>(history: DocumentHistory, cmd: Command<A>, args: A): DocumentHistory {
  const [doc, patches, inverse] = produceWithPatches(history.doc, (draft) => cmd.recipe(draft, args));
  if (patches.length === 0) return history;
  if (history.gesture) {
    const g = history.gesture;
    // Undoing a gesture undoes its commands last-first.
    return { ...history, doc, gesture: { label: g.label, patches: [...g.patches, ...patches], inverse: [...inverse, ...g.inverse] } };
  }
  return { doc, past: pushStep(history.past, { label: cmd.label, patches, inverse }), future: [], gesture: null };
}

/** Marks the start of a gesture (pointer down). */
export function beginGesture(history: DocumentHistory, label: string): DocumentHistory {
  const closed = endGesture(history);
  return { ...closed, gesture: { label, patches: [], inverse: [] } };
}

/** Commits the gesture as one step (pointer up); an empty gesture leaves no step. */
export function endGesture(history: DocumentHistory): DocumentHistory {
  const g = history.gesture;
  if (!g) return history;
  if (g.patches.length === 0) return { ...history, gesture: null };
  return { doc: history.doc, past: pushStep(history.past, g), future: [], gesture: null };
}

export function undo(history: DocumentHistory): DocumentHistory {
  const closed = endGesture(history);
  const step = closed.past[closed.past.length - 1];
  if (!step) return closed;
  return {
    doc: applyPatches(closed.doc, step.inverse),
    past: closed.past.slice(0, -1),
    future: [...closed.future, step],
    gesture: null,
  };
}

export function redo(history: DocumentHistory): DocumentHistory {
  const closed = endGesture(history);
  const step = closed.future[closed.future.length - 1];
  if (!step) return closed;
  return {
    doc: applyPatches(closed.doc, step.patches),
    past: pushStep(closed.past, step),
    future: closed.future.slice(0, -1),
    gesture: null,
  };
}

export const canUndo = (h: DocumentHistory): boolean => h.past.length > 0 || (h.gesture?.patches.length ?? 0) > 0;
export const canRedo = (h: DocumentHistory): boolean => h.future.length > 0;
