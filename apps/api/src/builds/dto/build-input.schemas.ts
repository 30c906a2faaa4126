import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { buildStatusSchema } from '../build-status.js';
import { versionSchema, pageSchema } from '../../common/validation/numbers.js';

const text = (max: number) => z.string().trim().max(max, `Use at most ${max} characters.`);

const vehicleShape = {
  year: text(20),
  make: text(80),
  model: text(80),
  engine: text(120),
  transmission: text(120),
};
const customerShape = {
  name: text(120),
  phone: text(40),
  email: z.union([z.literal(''), z.string().trim().pipe(z.email('Enter a valid e-mail address.').max(254))]),
};
const notesSchema = text(10_000);

const vehicleSchema = z.object(vehicleShape).partial();
const customerSchema = z.object(customerShape).partial();

export const createBuildSchema = z
  .object({
    vehicle: vehicleSchema.default({}),
    customer: customerSchema.default({}),
    notes: notesSchema.default(''),
    status: buildStatusSchema.default('open'),
  })
  .refine((build) => Boolean(build.vehicle.make || build.vehicle.model || build.customer.name), {
    message: 'Enter the vehicle make or model, or the customer name.',
    path: ['vehicle', 'make'],
  });
export class CreateBuildDto extends zodDto(createBuildSchema) {}
export type CreateBuildInput = z.output<typeof createBuildSchema>;

export const updateBuildSchema = z.object({
  version: versionSchema,
  vehicle: vehicleSchema.optional(),
  customer: customerSchema.optional(),
  notes: notesSchema.optional(),
  status: buildStatusSchema.optional(),
});
export class UpdateBuildDto extends zodDto(updateBuildSchema) {}
export type UpdateBuildInput = z.output<typeof updateBuildSchema>;

export const BUILD_SORTS = ['updatedAt', 'createdAt', 'customer'] as const;

/** `status=open,on-hold` (or repeated `status=`) filters by any of the listed statuses. */
const statusListSchema = z
  .union([z.string(), z.array(z.string())])
  .transform((value) => (Array.isArray(value) ? value : [value]).flatMap((item) => item.split(',')).map((s) => s.trim()))
  .pipe(z.array(buildStatusSchema).min(1));

export const listBuildsQuerySchema = z.object({
  search: z.string().trim().max(200).optional(),
  status: statusListSchema.optional(),
  sort: z.enum(BUILD_SORTS).default('updatedAt'),
  /** Defaults: newest first for dates, A to Z for the customer. */
  direction: z.enum(['asc', 'desc']).optional(),
  page: pageSchema,
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export class ListBuildsQueryDto extends zodDto(listBuildsQuerySchema) {}
export type ListBuildsQuery = z.output<typeof listBuildsQuerySchema>;
