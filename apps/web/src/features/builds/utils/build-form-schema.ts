import { z } from 'zod';
import { buildStatusSchema } from '../api/build-schema';

const text = (max: number, label: string) => z.string().trim().max(max, `Keep the ${label} under ${max} characters.`);
const required = (max: number, label: string, message: string) => text(max, label).min(1, message);

/** The newest model year a build can have: vehicles are sold as next year's model from mid-year. */
export const latestModelYear = (now: Date = new Date()) => now.getFullYear() + 1;
export const earliestModelYear = 1900;

/** The model year as the shop types it (the API keeps it as text), checked against today's date. */
function yearField(now: Date) {
  const latest = latestModelYear(now);
  const message = `Enter a year from ${earliestModelYear} to ${latest}, or leave it empty.`;
  return z
    .string()
    .trim()
    .refine((value) => {
      if (value === '') return true;
      const year = Number(value);
      return /^\d{4}$/.test(value) && year >= earliestModelYear && year <= latest;
    }, message);
}

/** The create/edit build form: what the fabricator types, as text, checked and converted here. */
export function buildFormSchema(now: Date = new Date()) {
  return z.object({
    year: yearField(now),
    make: required(60, 'make', 'Enter the vehicle make.'),
    model: required(60, 'model', 'Enter the vehicle model.'),
    engine: text(120, 'engine'),
    transmission: text(120, 'transmission'),
    customerName: required(120, 'customer name', 'Enter the customer name.'),
    customerPhone: text(40, 'phone number'),
    customerEmail: z
      .string()
      .trim()
      .max(254, 'Keep the e-mail address under 254 characters.')
      .refine((value) => value === '' || z.email().safeParse(value).success, 'Enter a valid e-mail address, or leave it empty.'),
    notes: text(4000, 'notes'),
    status: buildStatusSchema,
  });
}

export type BuildFormInput = z.input<ReturnType<typeof buildFormSchema>>;
export type BuildFormValues = z.output<ReturnType<typeof buildFormSchema>>;

export const emptyBuildForm: BuildFormInput = {
  year: '',
  make: '',
  model: '',
  engine: '',
  transmission: '',
  customerName: '',
  customerPhone: '',
  customerEmail: '',
  notes: '',
  status: 'open',
};
