import { circuitKindSchema, circuitSettingsSchema } from '@linesmith/routing';
import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { versionSchema, revisionNumberSchema } from '../../common/validation/numbers.js';

const nameSchema = z.string().trim().min(1, 'Enter a name.').max(120);
const { fluid, maxPressurePsi, maxTempF } = circuitSettingsSchema.shape;

/** Settings left out are filled from the kind's preset (`circuitKinds`). */
export const createCircuitSchema = z.object({
  kind: circuitKindSchema,
  name: nameSchema.optional(),
  fluid: fluid.optional(),
  maxPressurePsi: maxPressurePsi.optional(),
  maxTempF: maxTempF.optional(),
});
export class CreateCircuitDto extends zodDto(createCircuitSchema) {}
export type CreateCircuitInput = z.output<typeof createCircuitSchema>;

export const updateCircuitSchema = z.object({
  version: versionSchema,
  name: nameSchema.optional(),
  kind: circuitKindSchema.optional(),
  fluid: fluid.optional(),
  maxPressurePsi: maxPressurePsi.optional(),
  maxTempF: maxTempF.optional(),
});
export class UpdateCircuitDto extends zodDto(updateCircuitSchema) {}
export type UpdateCircuitInput = z.output<typeof updateCircuitSchema>;

export const createRevisionSchema = z.object({
  message: z.string().trim().max(500, 'Use at most 500 characters.').default(''),
});
export class CreateRevisionDto extends zodDto(createRevisionSchema) {}

export { revisionNumberSchema };
