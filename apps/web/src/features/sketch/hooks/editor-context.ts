import type { Part } from '@linesmith/catalog';
import type { CircuitEvaluation, LengthUnit, ShopRules } from '@linesmith/routing';
import { createContext, useContext } from 'react';
import type { EditorStore } from '../model/editor-store';

/** Everything the editor's panels and shapes share: the store, the catalogue, the rules and the live check. */
export interface EditorContextValue {
  store: EditorStore;
  parts: readonly Part[];
  partsById: ReadonlyMap<string, Part>;
  shopRules: ShopRules;
  evaluation: CircuitEvaluation;
  lengthUnit: LengthUnit;
  /** Centres the canvas on a sketch point (from the flags panel and the outline). */
  focusOn(point: { x: number; y: number }): void;
}

export const EditorContext = createContext<EditorContextValue | null>(null);

export function useEditor(): EditorContextValue {
  const value = useContext(EditorContext);
  if (!value) throw new Error('useEditor must be used inside the sketch editor');
  return value;
}
