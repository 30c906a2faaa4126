import { z } from 'zod';

/** The API's rule (users/password): at least 10 characters, at most 200. */
export const minPasswordLength = 10;

export const newPasswordFormSchema = z
  .object({
    password: z
      .string()
      .min(minPasswordLength, `Choose a password of at least ${minPasswordLength} characters.`)
      .max(200, 'Keep the password under 200 characters.'),
    confirm: z.string(),
  })
  .refine((values) => values.confirm === values.password, { path: ['confirm'], message: 'The two passwords differ.' });

export type NewPasswordFormValues = z.infer<typeof newPasswordFormSchema>;

export const forgotPasswordFormSchema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail address.').pipe(z.email('Enter a valid e-mail address.')),
});
