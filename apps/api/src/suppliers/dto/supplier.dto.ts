import { z } from 'zod';

/** The API shape of a supplier. */
export const supplierSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  email: z.string(),
  accountNumber: z.string(),
  phone: z.string(),
  notes: z.string(),
  active: z.boolean(),
  version: z.number().int(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type SupplierDto = z.infer<typeof supplierSchema>;
