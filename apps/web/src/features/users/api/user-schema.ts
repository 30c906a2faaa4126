import { z } from 'zod';
import { roleSchema } from '../../../lib/contract/role-schema';

export const userSchema = z.object({
  id: z.string().min(1),
  email: z.string().min(1),
  displayName: z.string(),
  roles: z.array(roleSchema),
  active: z.boolean(),
  version: z.number().int(),
  createdAt: z.iso.datetime({ offset: true }),
  updatedAt: z.iso.datetime({ offset: true }),
});

export type User = z.infer<typeof userSchema>;
