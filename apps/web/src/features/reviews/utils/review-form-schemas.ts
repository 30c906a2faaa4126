import { z } from 'zod';

export const MIN_ACKNOWLEDGEMENT_NOTE = 3;

/** A caution is acknowledged with a note saying what the reviewer checked or accepted. */
export const acknowledgeFormSchema = z.object({
  note: z
    .string()
    .trim()
    .min(MIN_ACKNOWLEDGEMENT_NOTE, `Write at least ${MIN_ACKNOWLEDGEMENT_NOTE} characters: what you checked, or why the caution is acceptable.`)
    .max(2000, 'Keep the note under 2000 characters.'),
});
export type AcknowledgeFormValues = z.infer<typeof acknowledgeFormSchema>;

/** A returned circuit always tells the fabricator what to change. */
export const returnFormSchema = z.object({
  comments: z
    .string()
    .trim()
    .min(MIN_ACKNOWLEDGEMENT_NOTE, 'Write what the fabricator must change before the circuit comes back.')
    .max(4000, 'Keep the comments under 4000 characters.'),
});
export type ReturnFormValues = z.infer<typeof returnFormSchema>;

export const approveFormSchema = z.object({ note: z.string().trim().max(2000, 'Keep the note under 2000 characters.') });
export type ApproveFormValues = z.infer<typeof approveFormSchema>;
