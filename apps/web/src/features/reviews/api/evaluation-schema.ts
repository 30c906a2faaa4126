import type { CircuitEvaluation } from '@linesmith/routing';
import { circuitCheckSchema } from '../../circuits/api/check-schema';

/**
 * `evaluateCircuit`'s result as the review endpoints send it: the same schema as the circuit
 * check, typed as the routing lib's `CircuitEvaluation` for the sketch preview and shop sheet.
 */
export const evaluationSchema = circuitCheckSchema.transform((raw) => raw as unknown as CircuitEvaluation);
