import { z } from 'zod';

/** Every error the API sends has this shape; extra fields (e.g. `current` on 409) pass through. */
export const apiErrorBodySchema = z.looseObject({
  statusCode: z.number().int(),
  code: z.string().min(1),
  message: z.string(),
  issues: z
    .array(z.object({ path: z.string(), message: z.string() }))
    .default([]),
});

export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;
