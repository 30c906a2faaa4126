import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { versionSchema } from '../../common/validation/numbers.js';

const nameSchema = z.string().trim().min(1, 'Enter a name.').max(120);
const emailSchema = z.union([z.literal(''), z.email('Enter a valid e-mail address.').max(254)]);
const shortText = z.string().trim().max(60);

const supplierFields = {
  name: nameSchema,
  email: z.string().trim().toLowerCase().pipe(emailSchema),
  accountNumber: shortText,
  phone: shortText,
  notes: z.string().trim().max(2000),
  active: z.boolean(),
};

export const createSupplierSchema = z.object({
  name: supplierFields.name,
  email: supplierFields.email.default(''),
  accountNumber: supplierFields.accountNumber.default(''),
  phone: supplierFields.phone.default(''),
  notes: supplierFields.notes.default(''),
  active: supplierFields.active.default(true),
});
export class CreateSupplierDto extends zodDto(createSupplierSchema) {}
export type NewSupplier = z.output<typeof createSupplierSchema>;

export const updateSupplierSchema = z.object({
  version: versionSchema,
  name: supplierFields.name.optional(),
  email: supplierFields.email.optional(),
  accountNumber: supplierFields.accountNumber.optional(),
  phone: supplierFields.phone.optional(),
  notes: supplierFields.notes.optional(),
  active: supplierFields.active.optional(),
});
export class UpdateSupplierDto extends zodDto(updateSupplierSchema) {}
export type SupplierChanges = z.output<typeof updateSupplierSchema>;

export const listSuppliersQuerySchema = z.object({
  includeInactive: z
    .enum(['true', 'false'])
    .transform((value) => value === 'true')
    .default(false),
});
export class ListSuppliersQueryDto extends zodDto(listSuppliersQuerySchema) {}
export type ListSuppliersQuery = z.output<typeof listSuppliersQuerySchema>;
