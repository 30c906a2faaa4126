import { z } from 'zod';
import { userFormFields } from './user-form-fields';

export const editUserFormSchema = z.object(userFormFields);

export type EditUserFormValues = z.infer<typeof editUserFormSchema>;
