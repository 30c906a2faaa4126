import { z } from 'zod';
import { userFormFields } from './user-form-fields';

export const inviteUserFormSchema = z.object({
  email: z.string().trim().min(1, 'Enter an e-mail address.').pipe(z.email('Enter a valid e-mail address.')),
  ...userFormFields,
});

export type InviteUserFormValues = z.infer<typeof inviteUserFormSchema>;
