import type { HoseLiner, PartKind, Fluid } from '@linesmith/catalog';

export const partKindLabels: Record<PartKind, string> = {
  hose: 'Hose',
  'hose-end': 'Hose end',
  adapter: 'Adapter',
  plug: 'Plug',
  clamp: 'Clamp',
  sleeve: 'Sleeve',
  seal: 'Seal',
  bulkhead: 'Bulkhead',
};

export const linerLabels: Record<HoseLiner, string> = { rubber: 'Rubber', cpe: 'CPE', ptfe: 'PTFE', nylon: 'Nylon' };

export const fluidLabels: Record<Fluid, string> = {
  atf: 'ATF',
  'engine-oil': 'Engine oil',
  gasoline: 'Gasoline',
  e85: 'E85',
  diesel: 'Diesel',
  'power-steering': 'Power steering',
  coolant: 'Coolant',
  air: 'Air',
};
