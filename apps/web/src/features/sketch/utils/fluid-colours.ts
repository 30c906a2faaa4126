import type { Fluid } from '@linesmith/catalog';

export type FluidClass = 'flammable' | 'combustible' | 'water-based' | 'compressed-air';

export interface FluidStyle {
  fluidClass: FluidClass;
  label: string;
  /** Field colour of the line. */
  stroke: string;
  /** Legend text on that field. */
  text: string;
}

/**
 * Line colours by fluid class after ASME A13.1 (scheme for the identification of piping systems):
 * flammable fluids yellow field with black text, combustible fluids brown with white, potable and
 * other water green with white, compressed air blue with white (colour pairs from memory of the
 * standard's Table 1). Diesel counts as combustible: flash point above 100 °F (NFPA 30 class II).
 */
export const fluidClassStyles: Readonly<Record<FluidClass, FluidStyle>> = {
  flammable: { fluidClass: 'flammable', label: 'Flammable (fuel)', stroke: '#f2c200', text: '#000000' },
  combustible: { fluidClass: 'combustible', label: 'Combustible (oil, ATF)', stroke: '#7b4a1e', text: '#ffffff' },
  'water-based': { fluidClass: 'water-based', label: 'Water-based (coolant)', stroke: '#1f7a3a', text: '#ffffff' },
  'compressed-air': { fluidClass: 'compressed-air', label: 'Compressed air', stroke: '#1f5fbf', text: '#ffffff' },
};

const classOfFluid: Readonly<Record<Fluid, FluidClass>> = {
  gasoline: 'flammable',
  e85: 'flammable',
  diesel: 'combustible',
  atf: 'combustible',
  'engine-oil': 'combustible',
  'power-steering': 'combustible',
  coolant: 'water-based',
  air: 'compressed-air',
};

export const fluidStyle = (fluid: Fluid): FluidStyle => fluidClassStyles[classOfFluid[fluid]];
