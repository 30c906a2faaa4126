import { z } from 'zod';

/** The roles of PRODUCT.md; a user holds one or more. */
export const ROLES = ['admin', 'fabricator', 'parts-clerk', 'reviewer'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;
