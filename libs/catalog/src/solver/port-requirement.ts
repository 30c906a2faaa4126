import { z } from 'zod';
import type { Part } from '../parts/part.schema.js';

/**
 * What a port demands of the part that sits in it, e.g. `{ feature: 'long-nose' }` for a
 * transmission return port that also feeds the gear train's lubrication.
 */
export const portRequirementSchema = z.object({ feature: z.string().trim().min(1) });
export type PortRequirement = z.infer<typeof portRequirementSchema>;

/** Whether a part carries the feature a port requires (only adapters list features). */
export function meetsRequirement(part: Part, requirement: PortRequirement): boolean {
  return part.kind === 'adapter' && part.attributes.features.includes(requirement.feature);
}
