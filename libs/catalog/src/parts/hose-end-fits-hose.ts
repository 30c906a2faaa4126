import type { HoseEndPart, HosePart } from './part.schema.js';

/**
 * A hose end fits a hose when it is made for the hose's dash size and hose type and, where both
 * say so, is a kind of hose end the hose is made for (a push-on barbed end on a hose made only for
 * crimped or reusable ends does not hold).
 */
export function hoseEndFitsHose(end: HoseEndPart, hose: HosePart): boolean {
  if (end.attributes.hoseDash !== hose.attributes.dash || !end.attributes.hoseTypes.includes(hose.attributes.hoseType)) return false;
  const { endType } = end.attributes;
  const { endTypes } = hose.attributes;
  return endType === undefined || endTypes === undefined || endTypes.includes(endType);
}
