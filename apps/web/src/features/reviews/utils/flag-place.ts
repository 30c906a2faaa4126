import type { CircuitDocument, Flag } from '@linesmith/routing';
import { portName } from '../../circuits/utils/end-stack-text';

/** "Line 2 (Transmission · cooler out → Cooler · inlet)": the item a flag points at, in the cut list's numbering. */
export function lineName(doc: CircuitDocument, lineId: string): string {
  const index = doc.lines.findIndex((l) => l.id === lineId);
  if (index < 0) return `Line ${lineId}`;
  const line = doc.lines[index];
  return `Line ${index + 1} (${portName(doc, line.from)} → ${portName(doc, line.to)})`;
}

/** Where on the circuit a flag points, in words. */
export function flagPlace(doc: CircuitDocument, flag: Pick<Flag, 'target'>): string {
  const t = flag.target;
  switch (t.kind) {
    case 'line':
      return lineName(doc, t.id);
    case 'joint': {
      if (!t.lineId) return t.unitId ? flagPlace(doc, { target: { kind: 'unit', id: t.unitId } }) : 'A joint';
      const line = doc.lines.find((l) => l.id === t.lineId);
      const end = t.end && line ? ` at ${portName(doc, line[t.end])}` : '';
      return `${lineName(doc, t.lineId)}${end}`;
    }
    case 'port':
      return t.unitId ? portName(doc, { unitId: t.unitId, portId: t.id }) : `Port ${t.id}`;
    case 'unit': {
      const unit = doc.units.find((u) => u.id === t.id);
      return unit ? unit.label || unit.kind : `Unit ${t.id}`;
    }
    case 'zone': {
      const zone = doc.heatZones.find((z) => z.id === t.id);
      return zone ? `Heat zone ${zone.label || zone.kind}` : `Heat zone ${t.id}`;
    }
    case 'circuit':
      return 'Whole circuit';
  }
}

/** The sketch items to highlight for a set of flags (lines, units, zones). */
export function flaggedIds(flags: readonly Pick<Flag, 'target'>[]): string[] {
  const ids = new Set<string>();
  for (const { target: t } of flags) {
    if (t.kind === 'line' || t.kind === 'zone' || t.kind === 'unit') ids.add(t.id);
    else if (t.lineId) ids.add(t.lineId);
    else if (t.unitId) ids.add(t.unitId);
  }
  return [...ids];
}
