import type { Part } from '@linesmith/catalog';
import type { CircuitDocument } from '../circuit/document.schema.js';
import type { LineAnalysis } from '../lines/analyse-line.js';
import type { Mater } from '../lines/end-stack.js';
import type { PortEntry } from '../lines/port-entry.js';
import type { Flag, FlagTarget, LineEnd, Severity } from './flag.js';
import type { ShopRules } from './shop-rules.js';

/** Everything a rule may read, computed once per evaluation so each rule stays a few lines. */
export interface RuleContext {
  doc: CircuitDocument;
  rules: ShopRules;
  parts: ReadonlyMap<string, Part>;
  /** Sketch scale; null when the circuit is not calibrated. */
  pxPerIn: number | null;
  /** Ports by `unitId/portId`. */
  ports: ReadonlyMap<string, PortEntry>;
  lines: readonly LineAnalysis[];
  /** The line on each connected port, by `unitId/portId`. */
  lineByPort: ReadonlyMap<string, LineAnalysis>;
  mate: Mater;
}

export interface Rule {
  code: string;
  severity: Severity;
  title: string;
  /** Plain words for the Reference page: what the rule checks and why. */
  description: string;
  check(ctx: RuleContext): Flag[];
}

export const lineTarget = (lineId: string): FlagTarget => ({ kind: 'line', id: lineId, lineId });

export const jointTarget = (lineId: string, end: LineEnd, index: number): FlagTarget => ({
  kind: 'joint',
  id: `${lineId}:${end}:${index}`,
  lineId,
  end,
  index,
});

export const portTarget = (unitId: string, portId: string): FlagTarget => ({ kind: 'port', id: portId, unitId });

/** A part as shop users know it: its description and the supplier's part number, never a database id. */
export const partName = (part: Part): string =>
  part.supplierPartNumber ? `${part.description} (${part.supplierPartNumber})` : part.description;

/** "from end" / "to end" of a line, with the port's label when there is one. */
export function endName(line: LineAnalysis, end: LineEnd): string {
  const entry = line[end];
  const label = entry ? [entry.unit.label || entry.unit.id, entry.port.label || entry.port.id].join(' ') : '';
  return label ? `the ${label} end` : `the ${end} end`;
}
