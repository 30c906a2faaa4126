import { z } from 'zod';

/** How the user wants lengths, pressures and temperatures shown (PRODUCT.md, Units). */
export const unitPreferencesSchema = z.object({
  length: z.enum(['in', 'mm']).catch('in'),
  pressure: z.enum(['psi', 'bar']).catch('psi'),
  temperature: z.enum(['F', 'C']).catch('F'),
});

export type UnitPreferences = z.infer<typeof unitPreferencesSchema>;

/** Shops cut to fractions of an inch and read gauges in psi and °F. */
export const defaultUnitPreferences: UnitPreferences = { length: 'in', pressure: 'psi', temperature: 'F' };
