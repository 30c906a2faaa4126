import { z } from 'zod';
import { connectionSpecSchema } from '../connections.js';
import { sealCompoundSchema } from '../seals/seal-compounds.js';
import { fluidSchema } from './fluids.js';
import { hoseClassSchema, hoseEndTypeSchema } from './hose-classes.js';

export { fluidSchema, type Fluid } from './fluids.js';

/** Part kinds kept in a shop's catalogue. DOMAIN.md §2. */
export const partKindSchema = z.enum(['hose', 'hose-end', 'adapter', 'plug', 'clamp', 'sleeve', 'seal', 'bulkhead']);
export type PartKind = z.infer<typeof partKindSchema>;

export const hoseLinerSchema = z.enum(['rubber', 'cpe', 'ptfe', 'nylon']);
export type HoseLiner = z.infer<typeof hoseLinerSchema>;

/** How a supplier sells a part: each, by the foot, or by the pack of N. */
export const saleUnitSchema = z.discriminatedUnion('type', [
  z.object({ type: z.literal('each') }),
  z.object({ type: z.literal('foot') }),
  z.object({ type: z.literal('pack'), size: z.number().int().positive() }),
]);
export type SaleUnit = z.infer<typeof saleUnitSchema>;

const positive = z.number().positive();
const dash = z.number().int().positive().max(64);
const angle = z.union([z.literal(0), z.literal(45), z.literal(90), z.literal(120), z.literal(150), z.literal(180)]);
const odRange = z
  .object({ minIn: positive, maxIn: positive })
  .refine((r) => r.minIn <= r.maxIn, { message: 'minIn must not exceed maxIn' });

/**
 * A seal a connection needs: an O-ring by AS568 dash number (or its ISO name where it has no
 * AS568 number), a crush washer (solid metal) or a bonded washer (metal ring with an elastomer
 * lip) by the thread it fits over ("M14", "1/4 BSP", "3/8 in").
 */
export const sealNeedSchema = z.discriminatedUnion('type', [
  z.object({ type: z.literal('o-ring'), as568: z.string().min(1) }),
  z.object({ type: z.literal('crush-washer'), size: z.string().min(1) }),
  z.object({ type: z.literal('bonded-washer'), size: z.string().min(1) }),
]);
export type SealNeed = z.infer<typeof sealNeedSchema>;

export const hoseAttributesSchema = z.object({
  dash,
  hoseType: z.string().min(1), // family of hose ends it takes, e.g. "braided-rubber", "ptfe-braided"
  /** The standard class the hose is made to (SAE J517 100R-series, J1532, J30, J2260, PTFE-lined…). */
  hoseClass: hoseClassSchema.optional(),
  /** The kinds of hose end made for it; left out when the hose type alone decides. */
  endTypes: z.array(hoseEndTypeSchema).min(1).optional(),
  idIn: positive,
  odIn: positive,
  liner: hoseLinerSchema,
  maxPressurePsi: positive,
  maxTempF: z.number(),
  minBendRadiusIn: positive,
  /**
   * Which radius the maker's minimum is quoted to. Hose makers quote it to the inside of the bend
   * (SAE J517 and makers' data: "measured to the innermost surface"); some quote the centreline.
   * Absent means inside.
   */
  minBendRadiusMeasuredTo: z.enum(['inside', 'centreline']).optional(),
  fluids: z.array(fluidSchema).min(1),
});

export const hoseEndAttributesSchema = z.object({
  hoseDash: dash,
  hoseTypes: z.array(z.string().min(1)).min(1),
  port: connectionSpecSchema,
  angle,
  allowanceIn: z.number().nonnegative(), // seal point to hose cut face
  /** Seal point to where the hose leaves the socket: the hose cannot bend inside it. Absent: the allowance is used. */
  rigidLengthIn: z.number().nonnegative().optional(),
  /** How far a male port-side thread reaches into a port past its face. */
  reachIn: z.number().nonnegative().optional(),
  boreIn: positive,
  maxPressurePsi: positive,
  /** How it holds the hose (reusable socket, crimp, push-on barbed with or without a clamp). */
  endType: hoseEndTypeSchema.optional(),
});

/** Compound of a seal that comes fitted to the part (an adapter's or plug's O-ring or washer). */
const fittedSeal = { sealCompound: sealCompoundSchema.optional() };

export const adapterAttributesSchema = z.object({
  a: connectionSpecSchema,
  b: connectionSpecSchema,
  angle,
  bodyLengthIn: z.number().nonnegative(),
  /** How far the male side that goes into a port (side a) reaches past the port face. */
  reachIn: z.number().nonnegative().optional(),
  boreIn: positive,
  features: z.array(z.string().min(1)).default([]),
  seal: sealNeedSchema.optional(),
  ...fittedSeal,
  maxPressurePsi: positive.optional(),
});

export const plugAttributesSchema = z.object({
  connection: connectionSpecSchema,
  /** How far the plug reaches past the port face. */
  reachIn: z.number().nonnegative().optional(),
  seal: sealNeedSchema.optional(),
  ...fittedSeal,
  maxPressurePsi: positive.optional(),
});
export const clampAttributesSchema = z.object({ fitsOd: odRange });
export const sleeveAttributesSchema = z.object({ fitsOd: odRange, maxTempF: z.number() });
export const sealAttributesSchema = z.object({
  seal: sealNeedSchema,
  /** Elastomer (or washer metal); left out on old rows, which the fluid rule then asks about. */
  compound: sealCompoundSchema.optional(),
  hardnessShoreA: z.number().int().min(30).max(100).optional(),
});
export const bulkheadAttributesSchema = z.object({
  a: connectionSpecSchema,
  b: connectionSpecSchema,
  bodyLengthIn: z.number().nonnegative(),
  boreIn: positive,
  maxPressurePsi: positive.optional(),
});

const common = {
  id: z.string().min(1),
  supplierId: z.string().min(1).nullable().default(null),
  supplierPartNumber: z.string().trim().max(64).default(''),
  description: z.string().trim().min(1).max(200),
  priceCents: z.number().int().nonnegative().default(0),
  saleUnit: saleUnitSchema.default({ type: 'each' }),
  stockOnHand: z.number().nonnegative().default(0),
  retired: z.boolean().default(false),
};

/** A catalogue part: common fields plus kind-specific attributes. */
export const partSchema = z.discriminatedUnion('kind', [
  z.object({ ...common, kind: z.literal('hose'), attributes: hoseAttributesSchema }),
  z.object({ ...common, kind: z.literal('hose-end'), attributes: hoseEndAttributesSchema }),
  z.object({ ...common, kind: z.literal('adapter'), attributes: adapterAttributesSchema }),
  z.object({ ...common, kind: z.literal('plug'), attributes: plugAttributesSchema }),
  z.object({ ...common, kind: z.literal('clamp'), attributes: clampAttributesSchema }),
  z.object({ ...common, kind: z.literal('sleeve'), attributes: sleeveAttributesSchema }),
  z.object({ ...common, kind: z.literal('seal'), attributes: sealAttributesSchema }),
  z.object({ ...common, kind: z.literal('bulkhead'), attributes: bulkheadAttributesSchema }),
]);
export type Part = z.infer<typeof partSchema>;
export type PartOf<K extends PartKind> = Extract<Part, { kind: K }>;
export type HosePart = PartOf<'hose'>;
export type HoseEndPart = PartOf<'hose-end'>;
export type AdapterPart = PartOf<'adapter'>;

/** Attribute schema per kind, for validating a stored row's JSONB on every write. */
export const partAttributeSchemas = {
  hose: hoseAttributesSchema,
  'hose-end': hoseEndAttributesSchema,
  adapter: adapterAttributesSchema,
  plug: plugAttributesSchema,
  clamp: clampAttributesSchema,
  sleeve: sleeveAttributesSchema,
  seal: sealAttributesSchema,
  bulkhead: bulkheadAttributesSchema,
} as const satisfies Record<PartKind, z.ZodType>;
