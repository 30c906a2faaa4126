import { SKETCH_LIMITS } from '../circuit/document.schema.js';
import type { Interval } from '../geometry/intervals.js';

export interface Span extends Interval {
  lengthIn: number;
}

/** Unsupported spans of a line of `lengthIn`: the ports count as supports at 0 and at the end. */
export function unsupportedSpans(lengthIn: number, supportsAtIn: readonly number[]): Span[] {
  const stops = [0];
  for (const at of supportsAtIn) if (at > 0 && at < lengthIn) stops.push(at);
  stops.push(lengthIn);
  let inOrder = true;
  for (let i = 1; i < stops.length && inOrder; i++) if (stops[i] < stops[i - 1]) inOrder = false;
  if (!inOrder) stops.sort((a, b) => a - b); // supports are usually listed from the from end already
  const spans: Span[] = [];
  for (let i = 0; i < stops.length - 1; i++) {
    const lengthOfSpan = stops[i + 1] - stops[i];
    if (lengthOfSpan > 0) spans.push({ start: stops[i], end: stops[i + 1], lengthIn: lengthOfSpan });
  }
  return spans;
}

/**
 * Fewest evenly spaced supports that leave no span longer than `spacingIn`; never more than a line
 * can hold (`SKETCH_LIMITS.supportsPerLine`), so an absurd length cannot flood the answer.
 */
export function proposeSupports(lengthIn: number, spacingIn: number): number[] {
  if (!(lengthIn > 0) || !(spacingIn > 0)) return [];
  const spans = Math.min(Math.ceil(lengthIn / spacingIn - 1e-9), SKETCH_LIMITS.supportsPerLine + 1);
  const at: number[] = [];
  for (let i = 1; i < spans; i++) at.push((i * lengthIn) / spans);
  return at;
}
