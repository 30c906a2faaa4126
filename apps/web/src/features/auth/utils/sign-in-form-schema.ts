import { z } from 'zod';

export const signInFormSchema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail address.').pipe(z.email('Enter a valid e-mail address.')),
  password: z.string().min(1, 'Enter your password.'),
});

export type SignInFormValues = z.infer<typeof signInFormSchema>;
