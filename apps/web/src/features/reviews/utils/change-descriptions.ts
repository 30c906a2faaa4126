import { formatCutLength, type CircuitDocument } from '@linesmith/routing';
import type { ComparisonResult } from '../api/comparison-schema';
import { lineName } from './flag-place';
import { partNames } from './part-names';

export interface ChangeGroup {
  title: string;
  items: string[];
}

const settingLabels: Readonly<Record<string, string>> = {
  fluid: 'Fluid',
  maxPressurePsi: 'Maximum pressure',
  maxTempF: 'Maximum temperature',
  calibration: 'Scale calibration',
  background: 'Background photo',
};
const slotLabels = { hose: 'hose', 'end-from': 'end stack at the start', 'end-to': 'end stack at the end' } as const;

const cut = (valueIn: number | null | undefined) => (valueIn === null || valueIn === undefined ? 'not worked out' : formatCutLength(valueIn, 'in'));

function unitName(doc: CircuitDocument, id: string): string {
  const unit = doc.units.find((u) => u.id === id);
  return unit ? unit.label || unit.kind : `Unit ${id}`;
}

function zoneName(doc: CircuitDocument, id: string): string {
  const zone = doc.heatZones.find((z) => z.id === id);
  return zone ? zone.label || zone.kind : id;
}

/** The comparison in shop words, grouped; groups without changes are left out. */
export function describeChanges({ comparison: c, before, after }: ComparisonResult): ChangeGroup[] {
  const names = new Map([...partNames(before.evaluation.bom), ...partNames(after.evaluation.bom)]);
  const parts = (ids: readonly string[]) => (ids.length === 0 ? 'none' : ids.map((id) => names.get(id) ?? `part ${id}`).join(' + '));
  const lineNow = (id: string) => lineName(after.document, id);
  const groups: ChangeGroup[] = [
    { title: 'Circuit', items: c.settings.map((key) => `${settingLabels[key] ?? key} changed`) },
    {
      title: 'Lines',
      items: [
        ...c.lines.added.map((id) => `Added: ${lineNow(id)}`),
        ...c.lines.removed.map((id) => `Removed: ${lineName(before.document, id)}`),
        ...c.lines.rerouted.map((r) =>
          r.oldCutLengthIn === undefined && r.newCutLengthIn === undefined
            ? `Re-routed: ${lineNow(r.lineId)}`
            : `Re-routed: ${lineNow(r.lineId)} — cut length ${cut(r.oldCutLengthIn)} → ${cut(r.newCutLengthIn)}`,
        ),
      ],
    },
    {
      title: 'Parts swapped',
      items: c.lines.partsSwapped.map((s) => `${lineNow(s.lineId)}, ${slotLabels[s.slot]}: ${parts(s.oldPartIds)} → ${parts(s.newPartIds)}`),
    },
    {
      title: 'Units',
      items: [
        ...c.units.added.map((id) => `Added: ${unitName(after.document, id)}`),
        ...c.units.removed.map((id) => `Removed: ${unitName(before.document, id)}`),
        ...c.units.moved.map((id) => `Moved: ${unitName(after.document, id)}`),
        ...c.units.changed.map((id) => `Ports or settings changed: ${unitName(after.document, id)}`),
      ],
    },
    {
      title: 'Heat zones',
      items: [
        ...c.heatZones.added.map((id) => `Added: ${zoneName(after.document, id)}`),
        ...c.heatZones.removed.map((id) => `Removed: ${zoneName(before.document, id)}`),
        ...c.heatZones.changed.map((id) => `Changed: ${zoneName(after.document, id)}`),
      ],
    },
    { title: 'Supports', items: c.supports.map((s) => `${lineNow(s.lineId)}: ${counts(s)}`) },
    { title: 'Sleeves', items: c.sleeves.map((s) => `${lineNow(s.lineId)}: ${counts(s)}`) },
  ];
  return groups.filter((g) => g.items.length > 0);
}

function counts(change: { added: string[]; removed: string[]; changed: string[] }): string {
  return [
    change.added.length ? `${change.added.length} added` : '',
    change.removed.length ? `${change.removed.length} removed` : '',
    change.changed.length ? `${change.changed.length} moved or resized` : '',
  ]
    .filter(Boolean)
    .join(', ');
}
