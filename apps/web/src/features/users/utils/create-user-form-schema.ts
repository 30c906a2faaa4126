import { z } from 'zod';
import { userFormFields } from './user-form-fields';

export const minPasswordLength = 10;

export const createUserFormSchema = z.object({
  email: z.string().trim().min(1, 'Enter an e-mail address.').pipe(z.email('Enter a valid e-mail address.')),
  ...userFormFields,
  password: z
    .string()
    .min(minPasswordLength, `The initial password needs at least ${minPasswordLength} characters.`)
    .max(200, 'Keep the password under 200 characters.'),
});

export type CreateUserFormValues = z.infer<typeof createUserFormSchema>;
