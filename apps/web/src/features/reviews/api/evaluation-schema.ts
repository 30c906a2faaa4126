import type { CircuitEvaluation } from '@linesmith/routing';
import { z } from 'zod';
import { bomRowSchema, severitySchema } from '../../circuits/api/check-schema';

/**
 * `evaluateCircuit`'s result as the review endpoints send it (unchanged from the routing lib).
 * The fields the review screens, the sketch preview and the shop sheet read are checked here;
 * the rest passes through, so the parsed value is the lib's `CircuitEvaluation`.
 */
const inches = z.number().finite();
const interval = z.looseObject({ start: inches, end: inches });

const lineReportSchema = z.looseObject({
  lineId: z.string().min(1),
  hosePartId: z.string().nullable(),
  measuredLengthIn: inches.nullable(),
  basis: z.enum(['measured', 'drawn']).nullable(),
  cutLengthIn: inches.nullable(),
  toleranceIn: inches.nullable(),
  fits: z.boolean(),
  supports: z.looseObject({ atIn: z.array(z.looseObject({ id: z.string(), atIn: inches })) }),
  sleeves: z.looseObject({
    plannedLengthIn: inches,
    placed: z.array(z.looseObject({ id: z.string(), startIn: inches, endIn: inches, lengthIn: inches, partId: z.string().nullable() })),
    uncoveredIn: z.array(interval),
  }),
});

export const flagTargetKindSchema = z.enum(['line', 'port', 'joint', 'zone', 'circuit', 'unit']);

export const reviewFlagSchema = z.looseObject({
  code: z.string().min(1),
  severity: severitySchema,
  message: z.string(),
  target: z.looseObject({
    kind: flagTargetKindSchema,
    id: z.string(),
    unitId: z.string().optional(),
    lineId: z.string().optional(),
    end: z.enum(['from', 'to']).optional(),
    index: z.number().int().optional(),
  }),
  fix: z.string(),
});

export const evaluationSchema = z
  .object({
    lines: z.array(lineReportSchema),
    flags: z.array(reviewFlagSchema),
    bom: z.looseObject({ rows: z.array(bomRowSchema) }),
  })
  .transform((raw) => raw as unknown as CircuitEvaluation);
