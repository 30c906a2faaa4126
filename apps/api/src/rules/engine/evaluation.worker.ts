import type { Part } from '@linesmith/catalog';
import { checkWorkBudget, createEvaluator, type CircuitDocument, type CircuitEvaluation, type CircuitEvaluator, type ShopRules } from '@linesmith/routing';

/**
 * The rules check, run in a worker thread of the engine pool (engine-pool.service.ts) so a large
 * circuit never holds up the server's event loop. The work budget is checked first; then the
 * shop's incremental evaluator (kept per shop, catalogue version and rules) checks the document,
 * re-using what it worked out for the lines of the last document it saw that did not change.
 */
export interface EvaluationTask {
  /** Shop, catalogue fingerprint, rules and tax rate: an evaluator is kept per value. */
  evaluatorKey: string;
  doc: CircuitDocument;
  parts: Part[];
  rules: ShopRules;
  taxRatePercent: number;
}

export type EvaluationAnswer = { kind: 'checked'; evaluation: CircuitEvaluation } | { kind: 'too-complex'; message: string };

/** Evaluators kept per worker; the least recently used goes first. */
const KEPT = 8;
const evaluators = new Map<string, CircuitEvaluator>();

export function evaluateTask(task: EvaluationTask): EvaluationAnswer {
  const verdict = checkWorkBudget(task.doc, task.rules);
  if (!verdict.ok) return { kind: 'too-complex', message: verdict.message };
  let evaluator = evaluators.get(task.evaluatorKey);
  if (evaluator) evaluators.delete(task.evaluatorKey);
  else evaluator = createEvaluator(task.parts, task.rules, { taxRatePercent: task.taxRatePercent });
  evaluators.set(task.evaluatorKey, evaluator);
  if (evaluators.size > KEPT) evaluators.delete(evaluators.keys().next().value as string);
  return { kind: 'checked', evaluation: evaluator.evaluate(task.doc) };
}

export default evaluateTask;
