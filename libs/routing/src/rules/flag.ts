/** Findings of the rules engine (DOMAIN §5). */
export type Severity = 'blocker' | 'caution' | 'note';

export const SEVERITY_ORDER: Readonly<Record<Severity, number>> = { blocker: 0, caution: 1, note: 2 };

export type LineEnd = 'from' | 'to';

export interface FlagTarget {
  kind: 'line' | 'port' | 'joint' | 'zone' | 'circuit' | 'unit';
  /** The line, port, zone or unit id; for a joint `<lineId>:<end>:<index>` or `<unitId>/<portId>:plug`. */
  id: string;
  /** The unit a port belongs to (port ids are unique per unit only). */
  unitId?: string;
  lineId?: string;
  end?: LineEnd;
  /** Joint number from the port outward (0 = port ↔ first part), or a corner's point index. */
  index?: number;
}

export interface Flag {
  code: string;
  severity: Severity;
  message: string;
  target: FlagTarget;
  fix: string;
}

const TARGET_KIND_ORDER: Readonly<Record<FlagTarget['kind'], number>> = {
  circuit: 0,
  unit: 1,
  port: 2,
  line: 3,
  joint: 4,
  zone: 5,
};

const text = (a: string | undefined, b: string | undefined) => {
  const x = a ?? '';
  const y = b ?? '';
  return x < y ? -1 : x > y ? 1 : 0; // code-unit order: the same on every machine and locale
};
const num = (a: number | undefined, b: number | undefined) => (a ?? -1) - (b ?? -1);

/** Stable order: severity, then target (kind, line, id, end, index), then code and message. */
export function compareFlags(a: Flag, b: Flag): number {
  return (
    SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity] ||
    TARGET_KIND_ORDER[a.target.kind] - TARGET_KIND_ORDER[b.target.kind] ||
    text(a.target.lineId, b.target.lineId) ||
    text(a.target.unitId, b.target.unitId) ||
    text(a.target.id, b.target.id) ||
    text(a.target.end, b.target.end) ||
    num(a.target.index, b.target.index) ||
    text(a.code, b.code) ||
    text(a.message, b.message)
  );
}
