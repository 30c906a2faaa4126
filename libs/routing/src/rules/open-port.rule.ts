import type { Flag } from './flag.js';
import { partName, portTarget, type Rule, type RuleContext } from './rule.js';
import type { PortEntry } from '../lines/port-entry.js';

/** Why the part named as a port's plug does not close it; undefined when it does. */
function plugProblem(ctx: RuleContext, entry: PortEntry, plugId: string): string | undefined {
  const plug = ctx.parts.get(plugId);
  if (!plug) return `its plug ${plugId} is not in the catalogue`;
  if (plug.kind !== 'plug') return `${partName(plug)} is named as its plug but is a ${plug.kind}, not a plug`;
  const result = ctx.mate(entry.port.connection, plug.attributes.connection);
  if (!result.ok) return `its plug ${partName(plug)} does not fit the port (${result.message})`;
  return undefined;
}

export const openPortRule: Rule = {
  code: 'open-port',
  severity: 'caution',
  title: 'Open port',
  description:
    'A port with no line and no plug: fluid will leak out or dirt will get in. A vent left open is a note, since it is meant to breathe. A plug that is not in the catalogue, is not a plug, or does not fit the port leaves the port open under pressure, which is a blocker.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const entry of ctx.ports.values()) {
      if (ctx.lineByPort.has(entry.key)) continue;
      const name = `Port ${entry.port.label || entry.port.id} on ${entry.unit.label || entry.unit.id}`;
      const target = portTarget(entry.unit.id, entry.port.id);
      const plugId = entry.port.plugPartId;
      if (!plugId && entry.port.role === 'vent') {
        flags.push({
          code: 'open-port',
          severity: 'note',
          message: `${name} is a vent left open to breathe.`,
          target,
          fix: 'Fit a breather or a vent line where dirt or water could get in; plug it only if the unit’s maker says so.',
        });
        continue;
      }
      if (!plugId) {
        flags.push({
          code: 'open-port',
          severity: 'caution',
          message: `${name} has no line and no plug.`,
          target,
          fix: 'Draw a line to this port or pick a plug for it.',
        });
        continue;
      }
      const problem = plugProblem(ctx, entry, plugId);
      if (!problem) continue;
      flags.push({
        code: 'open-port',
        severity: 'blocker',
        message: `${name} is not closed: ${problem}.`,
        target,
        fix: 'Pick a catalogue plug of the port’s own connection (family, size, and the opposite gender).',
      });
    }
    return flags;
  },
};
