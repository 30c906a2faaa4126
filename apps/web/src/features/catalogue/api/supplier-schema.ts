import { z } from 'zod';

/** A supplier as the API sends it. */
export const supplierSchema = z.object({
  id: z.string().min(1),
  name: z.string(),
  email: z.string(),
  accountNumber: z.string(),
  phone: z.string(),
  notes: z.string(),
  active: z.boolean(),
  version: z.number().int(),
  createdAt: z.iso.datetime({ offset: true }),
  updatedAt: z.iso.datetime({ offset: true }),
});
export type Supplier = z.infer<typeof supplierSchema>;

export const supplierListSchema = z.array(supplierSchema);

/** Body of `POST /api/suppliers`; PATCH sends the changed fields with `version`. */
export interface SupplierInput {
  name: string;
  email: string;
  accountNumber: string;
  phone: string;
  notes: string;
  active: boolean;
}
