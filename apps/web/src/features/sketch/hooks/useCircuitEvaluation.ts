import type { Part } from '@linesmith/catalog';
import { createEvaluator, type CircuitDocument, type CircuitEvaluation, type ShopRules } from '@linesmith/routing';
import { useDeferredValue, useMemo } from 'react';
import { useDebouncedValue } from '../../../lib/useDebouncedValue';

/** Milliseconds of quiet before the circuit is checked again; a drag does not re-check every frame. */
export const EVALUATION_DEBOUNCE_MS = 150;

/**
 * The rules engine run in the browser on the document, debounced and deferred so typing stays
 * smooth. The incremental evaluator (one per catalogue and rules) re-works only the lines an edit
 * touched: the editor's commands share every object they do not change.
 */
export function useCircuitEvaluation(doc: CircuitDocument, parts: readonly Part[], rules: ShopRules): CircuitEvaluation {
  const settled = useDeferredValue(useDebouncedValue(doc, EVALUATION_DEBOUNCE_MS));
  const evaluator = useMemo(() => createEvaluator(parts, rules), [parts, rules]);
  return useMemo(() => evaluator.evaluate(settled), [evaluator, settled]);
}
