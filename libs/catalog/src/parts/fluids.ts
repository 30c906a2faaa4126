import { z } from 'zod';

/** Fluids a circuit can carry; hoses, hose classes and seal compounds are rated against them. */
export const fluidSchema = z.enum(['atf', 'engine-oil', 'gasoline', 'e85', 'diesel', 'power-steering', 'coolant', 'air']);
export type Fluid = z.infer<typeof fluidSchema>;
