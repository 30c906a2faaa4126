import { z } from 'zod';
import type { Fluid } from './fluids.js';

/**
 * Standard classes of hose and tube. The fluids and temperature limits below are those the
 * standards write the class for, from memory until checked against each standard (marked per
 * row); a maker's own rating for a hose is its part's `fluids` and `maxTempF`.
 */
export const hoseClassSchema = z.enum([
  'sae-100r1',
  'sae-100r2',
  'sae-100r5',
  'sae-100r6',
  'sae-100r7',
  'sae-100r14',
  'sae-j1532-125',
  'sae-j1532-150',
  'sae-j1532-165',
  'sae-j30r6',
  'sae-j30r7',
  'sae-j30r9',
  'sae-j2260',
  'sae-j20',
  'sae-j189',
  'sae-j190',
  'ptfe-braided',
]);
export type HoseClass = z.infer<typeof hoseClassSchema>;

export interface HoseClassInfo {
  label: string;
  standard: string;
  fluids: readonly Fluid[];
  maxTempF: number;
  /** Rated working pressure of the class where the standard gives one figure for every size. */
  maxPressurePsi?: number;
  source: string;
}

const hydraulic: readonly Fluid[] = ['atf', 'engine-oil', 'power-steering'];
const fuelAndOil: readonly Fluid[] = ['gasoline', 'diesel', 'engine-oil'];
const every: readonly Fluid[] = ['atf', 'engine-oil', 'gasoline', 'e85', 'diesel', 'power-steering', 'coolant', 'air'];
const MEMORY = 'from memory until checked';

export const hoseClassInfo: Readonly<Record<HoseClass, HoseClassInfo>> = {
  'sae-100r1': { label: 'SAE 100R1 (one wire braid)', standard: 'SAE J517 100R1', fluids: hydraulic, maxTempF: 212, source: `SAE J517 100R1, petroleum hydraulic fluids, −40 to 100 °C (${MEMORY})` },
  'sae-100r2': { label: 'SAE 100R2 (two wire braids)', standard: 'SAE J517 100R2', fluids: hydraulic, maxTempF: 212, source: `SAE J517 100R2, petroleum hydraulic fluids, −40 to 100 °C (${MEMORY})` },
  'sae-100r5': { label: 'SAE 100R5 (textile and wire braid cover)', standard: 'SAE J517 100R5', fluids: hydraulic, maxTempF: 250, source: `SAE J517 100R5, petroleum hydraulic fluids, −40 to 121 °C (${MEMORY})` },
  'sae-100r6': { label: 'SAE 100R6 (one textile braid, low pressure)', standard: 'SAE J517 100R6', fluids: hydraulic, maxTempF: 212, source: `SAE J517 100R6, −40 to 100 °C (${MEMORY})` },
  'sae-100r7': { label: 'SAE 100R7 (thermoplastic)', standard: 'SAE J517 100R7', fluids: hydraulic, maxTempF: 200, source: `SAE J517 100R7, −40 to 93 °C (${MEMORY})` },
  'sae-100r14': { label: 'SAE 100R14 (PTFE with stainless braid)', standard: 'SAE J517 100R14', fluids: every, maxTempF: 400, source: `SAE J517 100R14, PTFE tube, −54 to 204 °C (${MEMORY})` },
  'sae-j1532-125': { label: 'Transmission oil cooler hose, 125 °C (SAE J1532)', standard: 'SAE J1532 Type A', fluids: ['atf'], maxTempF: 257, maxPressurePsi: 250, source: 'SAE J1532 Type A: 1.7 MPa (250 psi), temperature class 125 °C (DOMAIN.md §1)' },
  'sae-j1532-150': { label: 'Transmission oil cooler hose, 150 °C (SAE J1532)', standard: 'SAE J1532 Type A', fluids: ['atf'], maxTempF: 302, maxPressurePsi: 250, source: 'SAE J1532 Type A: 1.7 MPa (250 psi), temperature class 150 °C (DOMAIN.md §1)' },
  'sae-j1532-165': { label: 'Transmission oil cooler hose, 165 °C (SAE J1532)', standard: 'SAE J1532 Type A', fluids: ['atf'], maxTempF: 329, maxPressurePsi: 250, source: 'SAE J1532 Type A: 1.7 MPa (250 psi), temperature class 165 °C (DOMAIN.md §1)' },
  'sae-j30r6': { label: 'Fuel and oil hose, low pressure (SAE J30R6)', standard: 'SAE J30 R6', fluids: fuelAndOil, maxTempF: 212, source: `SAE J30 R6, not for fuel-injection pressure or ethanol blends, −40 to 100 °C (${MEMORY})` },
  'sae-j30r7': { label: 'Fuel and oil hose (SAE J30R7)', standard: 'SAE J30 R7', fluids: fuelAndOil, maxTempF: 257, source: `SAE J30 R7, −40 to 125 °C (${MEMORY})` },
  'sae-j30r9': { label: 'Fuel-injection hose (SAE J30R9)', standard: 'SAE J30 R9', fluids: fuelAndOil, maxTempF: 275, source: `SAE J30 R9, −40 to 135 °C (${MEMORY})` },
  'sae-j2260': { label: 'Nylon fuel tube (SAE J2260)', standard: 'SAE J2260', fluids: ['gasoline', 'e85', 'diesel'], maxTempF: 239, source: `SAE J2260 nonmetallic fuel system tubing, −40 to 115 °C (${MEMORY})` },
  'sae-j20': { label: 'Coolant hose (SAE J20)', standard: 'SAE J20', fluids: ['coolant'], maxTempF: 257, source: `SAE J20 coolant system hose, to 125 °C (${MEMORY})` },
  'sae-j189': { label: 'Power-steering return hose (SAE J189)', standard: 'SAE J189', fluids: ['power-steering'], maxTempF: 250, source: `SAE J189 low-pressure power-steering return hose, to 121 °C (${MEMORY})` },
  'sae-j190': { label: 'Power-steering pressure hose, wire braid (SAE J190)', standard: 'SAE J190', fluids: ['power-steering'], maxTempF: 250, source: `SAE J190 power-steering pressure hose, to 121 °C (${MEMORY})` },
  'ptfe-braided': { label: 'PTFE-lined braided hose', standard: 'PTFE liner, braided cover', fluids: every, maxTempF: 400, source: 'common practice: PTFE is inert to the fuels, oils and coolants listed; −65 to 204 °C typical' },
};

/** Why a hose class does not suit a circuit's fluid and temperature, or undefined when it does. */
export function hoseClassProblem(hoseClass: HoseClass, fluid: Fluid, maxTempF?: number): string | undefined {
  const info = hoseClassInfo[hoseClass];
  if (!info.fluids.includes(fluid)) return `${info.label} is made for ${info.fluids.join(', ')}, not ${fluid}`;
  if (maxTempF !== undefined && maxTempF > info.maxTempF) return `${info.label} is made for up to ${info.maxTempF} °F, below the circuit's ${maxTempF} °F`;
  return undefined;
}

/** How a hose end holds the hose. The push-on kinds are named in generic words. */
export const hoseEndTypeSchema = z.enum(['reusable', 'crimp', 'push-on', 'push-on-clamp']);
export type HoseEndType = z.infer<typeof hoseEndTypeSchema>;

export const hoseEndTypeLabels: Readonly<Record<HoseEndType, string>> = {
  reusable: 'Reusable socket',
  crimp: 'Crimped ferrule',
  'push-on': 'Push-on barbed (no clamp)',
  'push-on-clamp': 'Barbed with a hose clamp',
};
