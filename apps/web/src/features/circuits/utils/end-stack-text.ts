import type { CircuitDocument, CircuitLine } from '@linesmith/routing';

/** "Transmission · cooler out" for a line end, from the document's unit and port labels. */
export function portName(doc: CircuitDocument, ref: CircuitLine['from']): string {
  const unit = doc.units.find((u) => u.id === ref.unitId);
  const port = unit?.ports.find((p) => p.id === ref.portId);
  const unitName = unit ? unit.label || unit.kind : ref.unitId;
  const portLabel = port ? port.label || port.role : ref.portId;
  return `${unitName} · ${portLabel}`;
}

/** The parts of one end stack, port outward, by their catalogue descriptions where known. */
export function endStackParts(partIds: readonly string[], descriptions: ReadonlyMap<string, string>): string[] {
  return partIds.map((id) => descriptions.get(id) ?? `Part ${id}`);
}
