import type { CircuitDocument } from '@linesmith/routing';

export interface DraftSummary {
  units: number;
  ports: number;
  lines: number;
  heatZones: number;
  calibrated: boolean;
  hasBackground: boolean;
}

export function summariseDraft(doc: CircuitDocument): DraftSummary {
  return {
    units: doc.units.length,
    ports: doc.units.reduce((sum, unit) => sum + unit.ports.length, 0),
    lines: doc.lines.length,
    heatZones: doc.heatZones.length,
    calibrated: doc.calibration !== null,
    hasBackground: doc.background !== null,
  };
}
