import type { Fluid } from '@linesmith/catalog';

export const fluidLabels: Readonly<Record<Fluid, string>> = {
  atf: 'ATF',
  'engine-oil': 'Engine oil',
  gasoline: 'Gasoline',
  e85: 'E85',
  diesel: 'Diesel',
  'power-steering': 'Power-steering fluid',
  coolant: 'Coolant',
  air: 'Air',
};

/** Fuel and oil circuits carry the safety note (PRODUCT.md, Safety). */
const cautionFluids: ReadonlySet<Fluid> = new Set(['atf', 'engine-oil', 'gasoline', 'e85', 'diesel', 'power-steering']);

export function needsSafetyNote(fluid: Fluid): boolean {
  return cautionFluids.has(fluid);
}
