import type { Vec } from './vec.js';
import { distance } from './vec.js';

/**
 * Distinct types for sketch pixels and inches so one cannot be passed for the other by accident.
 * The brands exist only for the type checker; at run time both are plain numbers and objects.
 */
declare const spaceBrand: unique symbol;
export type Px = number & { readonly [spaceBrand]: 'px' };
export type Inches = number & { readonly [spaceBrand]: 'in' };
export type PointPx = Vec & { readonly [spaceBrand]: 'px' };
export type PointIn = Vec & { readonly [spaceBrand]: 'in' };

export const px = (value: number): Px => value as Px;
export const inches = (value: number): Inches => value as Inches;
export const pointPx = (x: number, y: number): PointPx => ({ x, y }) as PointPx;
export const pointIn = (x: number, y: number): PointIn => ({ x, y }) as PointIn;

export interface Calibration {
  a: Vec;
  b: Vec;
  knownIn: number;
}

/** Sketch scale: the pixel distance between the two calibration points over the known distance. */
export function pxPerIn(calibration: Calibration): number {
  return distance(calibration.a, calibration.b) / calibration.knownIn;
}

export const pxToIn = (value: Px, perIn: number): Inches => (value / perIn) as Inches;
export const pointPxToIn = (p: PointPx, perIn: number): PointIn => pointIn(p.x / perIn, p.y / perIn);
