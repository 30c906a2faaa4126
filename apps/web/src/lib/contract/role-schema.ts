import { z } from 'zod';

/** The four roles of the API contract; a user holds one or more. */
export const roleSchema = z.enum(['admin', 'fabricator', 'parts-clerk', 'reviewer']);

export type Role = z.infer<typeof roleSchema>;
