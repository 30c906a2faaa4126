import type { PartOf } from './part.schema.js';

/** A cushion clamp or fire sleeve fits a hose whose OD lies inside its range (ends included). */
export function fitsOd(clampOrSleeve: PartOf<'clamp'> | PartOf<'sleeve'>, hoseOdIn: number): boolean {
  const { minIn, maxIn } = clampOrSleeve.attributes.fitsOd;
  return hoseOdIn >= minIn && hoseOdIn <= maxIn;
}
