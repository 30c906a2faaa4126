import { formatLength, mmToIn, pxPerIn, type CircuitDocument, type LengthUnit } from '@linesmith/routing';

/** Sketch pixels per inch, or null when the sketch is not calibrated. */
export function sketchScale(doc: CircuitDocument): number | null {
  if (!doc.calibration) return null;
  const scale = pxPerIn(doc.calibration);
  return Number.isFinite(scale) && scale > 0 ? scale : null;
}

/** The status bar's scale text, e.g. "Scale: 20.0 px per inch (10" known)". */
export function scaleLabel(doc: CircuitDocument, unit: LengthUnit): string {
  const scale = sketchScale(doc);
  if (scale === null || !doc.calibration) return 'Not calibrated: press C and click two points a known distance apart';
  const perUnit = unit === 'mm' ? `${(scale * mmToIn(1)).toFixed(2)} px per mm` : `${scale.toFixed(1)} px per inch`;
  return `Scale: ${perUnit} (${formatLength(doc.calibration.knownIn, unit)} known)`;
}
