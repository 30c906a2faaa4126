import { partKindSchema } from '@linesmith/catalog';
import { z } from 'zod';

/**
 * The routing lib's `CircuitEvaluation` as the API sends it (`GET /api/circuits/:id/check`,
 * `POST /api/rules/evaluate`). The lib declares it as TypeScript types only, so the fields the
 * screens read are checked here; anything else passes through.
 */
const inches = z.number().finite();
/** An interval along a line, inches from its from end (the lib's geometry `Interval`). */
const interval = z.looseObject({ start: inches, end: inches });

export const lineReportSchema = z.looseObject({
  lineId: z.string().min(1),
  hosePartId: z.string().nullable(),
  drawnLengthIn: inches.nullable(),
  measuredLengthIn: inches.nullable(),
  centrelineIn: inches.nullable(),
  basis: z.enum(['measured', 'drawn']).nullable(),
  endStackFromIn: inches,
  endStackToIn: inches,
  crossesMounts: z.boolean(),
  slackIn: inches,
  // Optional: checks stored with signed-off revisions before slack applied to every line lack them.
  requiredSlackIn: inches.optional(),
  slackRule: z.enum(['percent', 'same-mount-minimum', 'cross-mount-minimum', 'override']).nullable().optional(),
  exactCutIn: inches.nullable(),
  cutLengthIn: inches.nullable(),
  toleranceIn: inches.nullable(),
  fits: z.boolean(),
  supports: z.looseObject({
    atIn: z.array(z.looseObject({ id: z.string(), atIn: inches })),
    longestSpanIn: inches,
    proposedAtIn: z.array(inches),
  }),
  sleeves: z.looseObject({
    requiredIn: z.array(interval),
    plannedIn: z.array(interval),
    plannedLengthIn: inches,
    uncoveredIn: z.array(interval),
    placed: z.array(z.looseObject({ id: z.string(), startIn: inches, endIn: inches, lengthIn: inches, partId: z.string().nullable() })),
    contact: z.boolean(),
  }),
  clampPartId: z.string().optional(),
});
export type LineReportView = z.infer<typeof lineReportSchema>;

export const severitySchema = z.enum(['blocker', 'caution', 'note']);
export type FlagSeverity = z.infer<typeof severitySchema>;

export const flagSchema = z.looseObject({
  code: z.string().min(1),
  severity: severitySchema,
  message: z.string(),
  target: z.looseObject({
    kind: z.enum(['line', 'port', 'joint', 'zone', 'circuit', 'unit']),
    id: z.string(),
    unitId: z.string().optional(),
    lineId: z.string().optional(),
    end: z.enum(['from', 'to']).optional(),
    index: z.number().int().optional(),
  }),
  fix: z.string(),
});
export type FlagView = z.infer<typeof flagSchema>;

export const bomRowSchema = z.looseObject({
  partId: z.string().nullable(),
  kind: partKindSchema,
  description: z.string(),
  quantity: z.number().finite(),
  unit: z.enum(['in', 'each']),
  priceCents: z.number().int().nullable(),
  supplierId: z.string().nullable(),
  supplierPartNumber: z.string(),
  lineIds: z.array(z.string()),
  cuts: z.number().int().optional(),
});
export type BomRowView = z.infer<typeof bomRowSchema>;

export const circuitCheckSchema = z.object({
  lines: z.array(lineReportSchema),
  flags: z.array(flagSchema),
  bom: z.looseObject({
    rows: z.array(bomRowSchema),
    subtotalCents: z.number().int(),
    taxCents: z.number().int(),
    totalCents: z.number().int(),
    unpricedRows: z.number().int(),
  }),
});
export type CircuitCheck = z.infer<typeof circuitCheckSchema>;
