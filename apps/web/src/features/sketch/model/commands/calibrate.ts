import { command } from './command';

export interface CalibrateArgs {
  a: { x: number; y: number };
  b: { x: number; y: number };
  /** The real distance between the two points, inches. */
  knownIn: number;
}

/**
 * Sets the sketch scale. Only the calibration is stored: every length is worked out from it, so a
 * re-calibration rescales all drawn lengths at once (measured lengths and positions along lines stay).
 */
export const calibrate = command<CalibrateArgs>('Calibrate', (draft, { a, b, knownIn }) => {
  if (!(knownIn > 0) || !Number.isFinite(knownIn)) throw new RangeError('The known distance must be more than 0 in');
  if (a.x === b.x && a.y === b.y) throw new RangeError('The two calibration points must differ');
  draft.calibration = { a: { x: a.x, y: a.y }, b: { x: b.x, y: b.y }, knownIn };
});
