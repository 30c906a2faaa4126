import { z } from 'zod';

export const supplierFormSchema = z.object({
  name: z.string().trim().min(1, 'Enter a name.').max(120, 'Keep the name under 120 characters.'),
  email: z.string().trim().pipe(z.union([z.literal(''), z.email('Enter a valid e-mail address.')])),
  accountNumber: z.string().trim().max(60, 'Keep the account number under 60 characters.'),
  phone: z.string().trim().max(60, 'Keep the phone number under 60 characters.'),
  notes: z.string().trim().max(2000, 'Keep the notes under 2000 characters.'),
  active: z.boolean(),
});

export type SupplierFormValues = z.input<typeof supplierFormSchema>;
