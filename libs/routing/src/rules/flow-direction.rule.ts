import type { CircuitUnit, PortRole } from '../circuit/document.schema.js';
import type { LineAnalysis } from '../lines/analyse-line.js';
import type { PortEntry } from '../lines/port-entry.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule, type RuleContext } from './rule.js';

export type FlowDirection = 'out' | 'in';

/** Which way fluid goes through a port of this role: out, feed and drain send it; in and return take it; a vent breathes. */
export const ROLE_DIRECTION: Readonly<Record<PortRole, FlowDirection | null>> = {
  out: 'out',
  feed: 'out',
  drain: 'out',
  in: 'in',
  return: 'in',
  vent: null,
};

/** A bulkhead plate passes fluid either way, so its ports say nothing about direction. */
export function portDirection(unit: CircuitUnit, role: PortRole): FlowDirection | null {
  return unit.kind === 'bulkhead-plate' ? null : ROLE_DIRECTION[role];
}

const portName = (entry: PortEntry) => `${entry.unit.label || entry.unit.id} ${entry.port.label || entry.port.id} (${entry.port.role})`;

/** True when the units joined by lines other than `skip` link `startUnitId` to `goalUnitId`. */
function linkedWithout(ctx: RuleContext, skip: LineAnalysis, startUnitId: string, goalUnitId: string): boolean {
  const next = new Map<string, string[]>();
  for (const line of ctx.lines) {
    if (line === skip) continue;
    const a = line.line.from.unitId;
    const b = line.line.to.unitId;
    next.set(a, [...(next.get(a) ?? []), b]);
    next.set(b, [...(next.get(b) ?? []), a]);
  }
  const seen = new Set([startUnitId]);
  const queue = [startUnitId];
  while (queue.length > 0) {
    const unitId = queue.shift()!;
    if (unitId === goalUnitId) return true;
    for (const other of next.get(unitId) ?? []) {
      if (!seen.has(other)) {
        seen.add(other);
        queue.push(other);
      }
    }
  }
  return false;
}

export const flowDirectionRule: Rule = {
  code: 'flow-direction',
  severity: 'caution',
  title: 'Flow direction',
  description:
    'Fluid leaves a unit through its out, feed and drain ports and enters through its in and return ports. A line must join a port that sends fluid to one that takes it: outlet to outlet (or inlet to inlet) means a port role or a unit’s inlet/outlet marking is wrong, or the line goes to the wrong port. A return port takes fluid back from its own unit’s circuit: the units on the other end must lead back to that unit.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const { from, to } = line;
      if (!from || !to) continue;
      const a = portDirection(from.unit, from.port.role);
      const b = portDirection(to.unit, to.port.role);
      if (a !== null && a === b) {
        const both = a === 'out' ? 'both send fluid out' : 'both take fluid in';
        const feed = [from, to].find((e) => e.port.role === 'feed');
        flags.push({
          code: 'flow-direction',
          severity: 'caution',
          message: `The line joins ${portName(from)} and ${portName(to)}, which ${both}: fluid cannot flow through it as drawn.`,
          target: lineTarget(line.line.id),
          fix: feed
            ? `Check the port roles: a feed port supplies fluid; if ${feed.port.label || feed.port.id} on ${feed.unit.label || feed.unit.id} is the unit’s inlet, set its role to in. Otherwise connect an outlet to an inlet.`
            : 'Check the port roles and the unit’s inlet/outlet marking, or connect the line to the other port.',
        });
      }
      for (const [ret, other] of [
        [from, to],
        [to, from],
      ] as const) {
        if (ret.port.role !== 'return' || other.unit.id === ret.unit.id) continue;
        if (linkedWithout(ctx, line, other.unit.id, ret.unit.id)) continue;
        flags.push({
          code: 'flow-direction',
          severity: 'caution',
          message: `${portName(ret)} takes fluid from ${other.unit.label || other.unit.id}, which no other line links back to ${ret.unit.label || ret.unit.id}: the fluid returning here never left this unit’s circuit.`,
          target: lineTarget(line.line.id),
          fix: `Connect the return to the circuit that leaves ${ret.unit.label || ret.unit.id} (for example the cooler fed by its out port), or draw the missing line.`,
        });
      }
    }
    return flags;
  },
};
