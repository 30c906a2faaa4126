import { z } from 'zod';
import type { Fluid } from '@linesmith/catalog';

/** What a circuit does on the vehicle; picks the starting fluid, pressure and temperature. */
export const circuitKindSchema = z.enum([
  'transmission-cooler',
  'engine-oil-cooler',
  'fuel',
  'turbo-oil',
  'power-steering',
  'coolant',
  'other',
]);
export type CircuitKind = z.infer<typeof circuitKindSchema>;

export interface CircuitKindPreset {
  label: string;
  fluid: Fluid;
  maxPressurePsi: number;
  maxTempF: number;
  /** Where the defaults come from: shop habit, to be replaced by the component makers' figures. */
  origin: 'common practice';
  note: string;
}

/**
 * Starting values filled in when a circuit of this kind is created. They are common shop practice
 * with a margin over typical operating figures, not ratings: the fabricator must set the real
 * maximum pressure and temperature from the makers' data for the pump, transmission or engine.
 */
export const circuitKinds: Readonly<Record<CircuitKind, CircuitKindPreset>> = {
  'transmission-cooler': {
    label: 'Transmission cooler',
    fluid: 'atf',
    maxPressurePsi: 150,
    maxTempF: 250,
    origin: 'common practice',
    note: 'Cooler lines of an automatic transmission; one return port may also feed gear-train lubrication.',
  },
  'engine-oil-cooler': {
    label: 'Engine-oil cooler',
    fluid: 'engine-oil',
    maxPressurePsi: 150,
    maxTempF: 300,
    origin: 'common practice',
    note: 'Cold-start oil pressure runs well above the warm figure; rate for the cold start.',
  },
  fuel: {
    label: 'Fuel feed and return',
    fluid: 'gasoline',
    maxPressurePsi: 100,
    maxTempF: 200,
    origin: 'common practice',
    note: 'Set the fluid to E85 or diesel where it applies: ethanol blends need a liner rated for them.',
  },
  'turbo-oil': {
    label: 'Turbo oil feed and drain',
    fluid: 'engine-oil',
    maxPressurePsi: 150,
    maxTempF: 300,
    origin: 'common practice',
    note: 'The feed sees full oil pressure; the drain sees little pressure but the hottest oil.',
  },
  'power-steering': {
    label: 'Power steering',
    fluid: 'power-steering',
    maxPressurePsi: 1500,
    maxTempF: 250,
    origin: 'common practice',
    note: 'The pressure side carries the pump relief pressure; the return side is low pressure.',
  },
  coolant: {
    label: 'Coolant',
    fluid: 'coolant',
    maxPressurePsi: 30,
    maxTempF: 250,
    origin: 'common practice',
    note: 'Pressure follows the radiator cap rating; allow a margin above it.',
  },
  other: {
    label: 'Other',
    fluid: 'engine-oil',
    maxPressurePsi: 150,
    maxTempF: 250,
    origin: 'common practice',
    note: 'Generic starting values: set the fluid, pressure and temperature of this circuit before choosing hose.',
  },
};
