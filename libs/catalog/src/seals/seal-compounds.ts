import { z } from 'zod';
import type { Fluid } from '../parts/fluids.js';

/**
 * Seal materials: elastomer compounds for O-rings and bonded washers, metals for crush washers.
 */
export const sealCompoundSchema = z.enum(['nitrile', 'hnbr', 'fluorocarbon', 'ptfe', 'epdm', 'neoprene', 'copper', 'aluminium']);
export type SealCompound = z.infer<typeof sealCompoundSchema>;

export const sealCompoundLabels: Readonly<Record<SealCompound, string>> = {
  nitrile: 'nitrile',
  hnbr: 'hydrogenated nitrile',
  fluorocarbon: 'fluorocarbon',
  ptfe: 'PTFE',
  epdm: 'EPDM',
  neoprene: 'neoprene',
  copper: 'copper',
  aluminium: 'aluminium',
};

export type CompoundRating = 'ok' | 'limited' | 'no';

/**
 * Fluid compatibility of seal compounds: common practice, as the elastomer compatibility charts
 * of seal makers rate them (from memory until checked against a published chart). "limited":
 * usable with care (swell or shorter life), never for a seal that must last.
 */
export const COMPOUND_SOURCE = 'common practice (elastomer compatibility charts), from memory';

const o = 'ok' as const;
const l = 'limited' as const;
const x = 'no' as const;

//                                   atf engine-oil gasoline e85 diesel power-steering coolant air
const ratingRows: Readonly<Record<SealCompound, readonly CompoundRating[]>> = {
  nitrile: /*      */ [o, o, o, x, o, o, o, o],
  hnbr: /*         */ [o, o, l, l, o, o, o, o],
  fluorocarbon: /* */ [o, o, o, o, o, o, o, o],
  ptfe: /*         */ [o, o, o, o, o, o, o, o],
  epdm: /*         */ [x, x, x, x, x, x, o, o],
  neoprene: /*     */ [l, l, x, x, l, l, o, o],
  copper: /*       */ [o, o, o, o, o, o, o, o],
  aluminium: /*    */ [o, o, o, o, o, o, o, o],
};
const fluidColumns: readonly Fluid[] = ['atf', 'engine-oil', 'gasoline', 'e85', 'diesel', 'power-steering', 'coolant', 'air'];

/**
 * Highest service temperature of each compound, °F (common practice, typical general-purpose
 * grades, from memory): nitrile 250 (121 °C), HNBR 300 (149 °C), fluorocarbon 400 (204 °C),
 * PTFE 500 (260 °C), EPDM 300 (149 °C), neoprene 250 (121 °C). Metal washers: not limiting here.
 */
export const compoundMaxTempF: Readonly<Partial<Record<SealCompound, number>>> = {
  nitrile: 250,
  hnbr: 300,
  fluorocarbon: 400,
  ptfe: 500,
  epdm: 300,
  neoprene: 250,
};

export function compoundRating(compound: SealCompound, fluid: Fluid): CompoundRating {
  return ratingRows[compound][fluidColumns.indexOf(fluid)];
}

/** Which compound a shop reaches for first, per fluid (common practice). */
const preference: Readonly<Record<Fluid, readonly SealCompound[]>> = {
  atf: ['nitrile', 'hnbr', 'fluorocarbon', 'ptfe'],
  'engine-oil': ['nitrile', 'hnbr', 'fluorocarbon', 'ptfe'],
  gasoline: ['fluorocarbon', 'nitrile', 'ptfe'],
  e85: ['fluorocarbon', 'ptfe'],
  diesel: ['nitrile', 'fluorocarbon', 'hnbr', 'ptfe'],
  'power-steering': ['nitrile', 'hnbr', 'fluorocarbon', 'ptfe'],
  coolant: ['epdm', 'hnbr', 'nitrile', 'fluorocarbon', 'ptfe'],
  air: ['nitrile', 'epdm', 'fluorocarbon', 'ptfe'],
};

/** Why a compound does not suit the fluid and temperature, or undefined when it does. */
export function compoundProblem(compound: SealCompound, fluid: Fluid, maxTempF?: number): string | undefined {
  const rating = compoundRating(compound, fluid);
  if (rating === 'no') return `${sealCompoundLabels[compound]} is not compatible with ${fluid}`;
  if (rating === 'limited') return `${sealCompoundLabels[compound]} has only limited compatibility with ${fluid}`;
  const limit = compoundMaxTempF[compound];
  if (maxTempF !== undefined && limit !== undefined && maxTempF > limit) {
    return `${sealCompoundLabels[compound]} is good to about ${limit} °F, below the circuit's ${maxTempF} °F`;
  }
  return undefined;
}

/** Elastomer compounds that suit the fluid (rated ok) and temperature, the usual choice first. */
export function suitableCompounds(fluid: Fluid, maxTempF?: number): SealCompound[] {
  return preference[fluid].filter((c) => compoundProblem(c, fluid, maxTempF) === undefined);
}
