import { z } from 'zod';

/** One e-mail Linesmith tried to send (`GET /api/outbox`), newest first. */
export const outboxEntrySchema = z
  .looseObject({
    id: z.string().optional(),
    to: z.string(),
    subject: z.string(),
    status: z.enum(['sent', 'failed']),
    error: z.string().nullish().transform((v) => v ?? null),
    attachmentNames: z.array(z.string()).optional(),
    attachments: z.array(z.union([z.string(), z.looseObject({ filename: z.string() })])).optional(),
    createdAt: z.iso.datetime({ offset: true }),
  })
  .transform(({ attachmentNames, attachments, ...entry }) => ({
    ...entry,
    attachments: attachmentNames ?? (attachments ?? []).map((a) => (typeof a === 'string' ? a : a.filename)),
  }));
export type OutboxEntry = z.output<typeof outboxEntrySchema>;

export const outboxSchema = z.array(outboxEntrySchema);
