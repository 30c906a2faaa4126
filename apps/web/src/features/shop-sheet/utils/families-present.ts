import { partConnections, type Family, type Part } from '@linesmith/catalog';
import type { CircuitDocument } from '@linesmith/routing';

/** Connection families the circuit joins: every port's, and both ends of each adapter and hose end used. */
export function familiesPresent(doc: CircuitDocument, parts: ReadonlyMap<string, Part>): Set<Family> {
  const found = new Set<Family>();
  for (const unit of doc.units) for (const port of unit.ports) found.add(port.connection.family);
  for (const line of doc.lines) {
    for (const id of [...line.endStacks.from, ...line.endStacks.to]) {
      const part = parts.get(id);
      if (part) for (const end of partConnections(part)) found.add(end.family);
    }
  }
  return found;
}
