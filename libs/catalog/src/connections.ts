import { z } from 'zod';

/**
 * Connection families: the thread and seat standard of a port or fitting end. See DOMAIN.md §1
 * and §7 for the ids; `standards/tables.ts` holds each family's table and label.
 */
export const familySchema = z.enum([
  'flare37',
  'flare45',
  'invflare45',
  'orb',
  'npt',
  'nptf',
  'npsm',
  'bspp',
  'bspt',
  'orfs',
  'metric',
  'banjo',
  'qc',
  'barb',
]);
export type Family = z.infer<typeof familySchema>;

export const genderSchema = z.enum(['male', 'female']);
export type Gender = z.infer<typeof genderSchema>;

/**
 * How a straight port thread seals, for the families that come in several seat forms on one
 * thread (metric and BSP parallel). The thread alone does not say it: an M14x1.5 port may take an
 * O-ring stud, a washer-sealed stud, a sealing-edge stud or a 24° cone. See `standards/seat-forms.ts`.
 */
export const seatFormSchema = z.enum(['o-ring', 'bonded-washer', 'sealing-edge', 'cone24-l', 'cone24-s', 'cone60']);
export type SeatForm = z.infer<typeof seatFormSchema>;

/**
 * Size strings: flare37, orb, orfs and barb use dash sizes ("-6"); flare45 and invflare45 the tube
 * OD in inches ("3/8"); npt, nptf, npsm, bspp and bspt the nominal pipe size ("1/4"); metric the
 * thread ("M14x1.5"); banjo the bolt thread ("M14x1.5", "3/8-24"); qc the tube OD ("3/8", "8mm").
 * `seat` is read for metric and bspp only (when left out: O-ring for metric, the ISO 6149 port
 * the metric family meant before seat forms existed; bonded washer for bspp).
 */
export const connectionSpecSchema = z.object({
  family: familySchema,
  size: z.string().trim().min(1, 'Size is required'),
  gender: genderSchema,
  seat: seatFormSchema.optional(),
});
export type ConnectionSpec = z.infer<typeof connectionSpecSchema>;
