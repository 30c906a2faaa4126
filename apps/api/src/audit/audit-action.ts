import { z } from 'zod';

/** What can happen to a circuit on its way from sketch to vehicle, as recorded in the audit trail. */
export const AUDIT_ACTIONS = ['submit', 'acknowledge', 'approve', 'return', 'order', 'install'] as const;
export const auditActionSchema = z.enum(AUDIT_ACTIONS);
export type AuditAction = z.infer<typeof auditActionSchema>;
