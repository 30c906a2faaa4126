import { z } from 'zod';
import { circuitDocumentField } from '../../circuits/api/circuit-document-field';
import { circuitStatusSchema } from '../../circuits/api/circuit-schema';
import { evaluationSchema } from './evaluation-schema';

const isoTime = z.iso.datetime({ offset: true });
export const personSchema = z.object({ id: z.string().min(1), displayName: z.string() });
export type Person = z.infer<typeof personSchema>;
/** A user the server names; null where the account is gone. */
const someone = personSchema.nullable();
/** How a person is shown when the account is gone. */
export const personName = (person: Person | null) => person?.displayName ?? 'a former user';

/** One row of `GET /api/reviews`. */
export const reviewQueueRowSchema = z.object({
  circuitId: z.string().min(1),
  circuitName: z.string(),
  build: z.object({ id: z.string().min(1), label: z.string() }),
  fabricator: someone,
  revisionNumber: z.number().int().positive(),
  submittedAt: isoTime,
  blockers: z.number().int().nonnegative(),
  cautions: z.number().int().nonnegative(),
});
export type ReviewQueueRow = z.infer<typeof reviewQueueRowSchema>;
export const reviewQueueSchema = z.array(reviewQueueRowSchema);

export const acknowledgementSchema = z.object({
  flagKey: z.string().min(1),
  note: z.string(),
  by: someone,
  at: isoTime,
});
export type Acknowledgement = z.infer<typeof acknowledgementSchema>;

/** The reviewer's decision on the revision: the approval note or the return comments. */
export const decisionSchema = z
  .object({
    kind: z.enum(['approved', 'returned']),
    by: someone,
    at: isoTime,
    note: z.string().nullish(),
    comments: z.string().nullish(),
  })
  .transform(({ note, comments, ...rest }) => ({ ...rest, text: (rest.kind === 'returned' ? (comments ?? note) : (note ?? comments)) ?? '' }));
export type Decision = z.infer<typeof decisionSchema>;

/** `GET /api/circuits/:id/review`: the submitted revision, its check, and what the reviewer did. */
export const circuitReviewSchema = z.object({
  status: circuitStatusSchema,
  revisionNumber: z.number().int().positive(),
  document: circuitDocumentField,
  evaluation: evaluationSchema,
  acknowledgements: z.array(acknowledgementSchema),
  decision: decisionSchema.nullish().transform((d) => d ?? null),
  submittedBy: personSchema.nullish().transform((p) => p ?? null),
});
export type CircuitReview = z.infer<typeof circuitReviewSchema>;

/** `GET /api/circuits/:id/audit`, oldest first or newest first as the server keeps it. */
export const auditEntrySchema = z.object({
  action: z.string().min(1),
  actor: someone,
  revisionNumber: z.number().int().positive().nullable(),
  details: z.unknown(),
  at: isoTime,
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;
export const auditTrailSchema = z.array(auditEntrySchema);
