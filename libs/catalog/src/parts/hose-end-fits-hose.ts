import type { HoseEndPart, HosePart } from './part.schema.js';

/** A hose end fits a hose when it is made for the hose's dash size and hose type. */
export function hoseEndFitsHose(end: HoseEndPart, hose: HosePart): boolean {
  return end.attributes.hoseDash === hose.attributes.dash && end.attributes.hoseTypes.includes(hose.attributes.hoseType);
}
