import { partKindSchema, saleUnitSchema, type SaleUnit } from '@linesmith/catalog';
import { z } from 'zod';

/** The editor's common fields as typed; `toCommonFields` turns them into the API's part fields. */
export interface PartFormValues {
  kind: string;
  description: string;
  supplierId: string;
  supplierPartNumber: string;
  price: string;
  saleUnitType: string;
  packSize: string;
  stockOnHand: string;
}

const moneyText = /^\d+(\.\d{1,2})?$/;

export const partFormSchema = z
  .object({
    kind: partKindSchema,
    description: z.string().trim().min(1, 'Enter a description.').max(200, 'Keep the description under 200 characters.'),
    supplierId: z.string(),
    supplierPartNumber: z.string().trim().max(64, 'Keep the part number under 64 characters.'),
    price: z
      .string()
      .trim()
      .refine((text) => text === '' || moneyText.test(text), 'Enter the price as an amount such as 12.50.'),
    saleUnitType: z.enum(['each', 'foot', 'pack'], 'Choose how the supplier sells it.'),
    packSize: z.string().trim(),
    stockOnHand: z
      .string()
      .trim()
      .refine((text) => text === '' || (Number.isFinite(Number(text)) && Number(text) >= 0), 'Enter a stock count of 0 or more.'),
  })
  .superRefine((values, ctx) => {
    if (values.saleUnitType !== 'pack') return;
    const size = Number(values.packSize);
    if (!Number.isInteger(size) || size < 1) {
      ctx.addIssue({ code: 'custom', path: ['packSize'], message: 'Enter how many come in a pack (a whole number).' });
    }
  });

export type CommonPartFields = {
  kind: z.infer<typeof partKindSchema>;
  description: string;
  supplierId: string | null;
  supplierPartNumber: string;
  priceCents: number;
  saleUnit: SaleUnit;
  stockOnHand: number;
};

/** Amount text ("12.5") → whole cents without floating-point drift. */
export function centsFromText(text: string): number {
  if (text.trim() === '') return 0;
  const [whole, fraction = ''] = text.trim().split('.');
  return Number(whole) * 100 + Number(fraction.padEnd(2, '0'));
}

export function centsToText(cents: number): string {
  return `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;
}

export function toCommonFields(values: z.output<typeof partFormSchema>): CommonPartFields {
  const saleUnit = saleUnitSchema.parse(
    values.saleUnitType === 'pack' ? { type: 'pack', size: Number(values.packSize) } : { type: values.saleUnitType },
  );
  return {
    kind: values.kind,
    description: values.description,
    supplierId: values.supplierId || null,
    supplierPartNumber: values.supplierPartNumber,
    priceCents: centsFromText(values.price),
    saleUnit,
    stockOnHand: values.stockOnHand === '' ? 0 : Number(values.stockOnHand),
  };
}
