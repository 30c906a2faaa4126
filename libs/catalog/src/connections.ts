import { z } from 'zod';

/** Connection families: the thread and seat standard of a port or fitting end. See DOMAIN.md §1. */
export const familySchema = z.enum(['flare37', 'flare45', 'invflare45', 'orb', 'npt', 'metric', 'barb']);
export type Family = z.infer<typeof familySchema>;

export const genderSchema = z.enum(['male', 'female']);
export type Gender = z.infer<typeof genderSchema>;

/**
 * Size strings: flare37, orb and barb use dash sizes ("-6"); flare45 and invflare45 the tube OD
 * in inches ("3/8"); npt the nominal pipe size ("1/4"); metric the thread ("M14x1.5").
 */
export const connectionSpecSchema = z.object({
  family: familySchema,
  size: z.string().trim().min(1, 'Size is required'),
  gender: genderSchema,
});
export type ConnectionSpec = z.infer<typeof connectionSpecSchema>;
