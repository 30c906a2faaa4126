import type { Flag } from './flag.js';
import { portTarget, type Rule } from './rule.js';

export const openPortRule: Rule = {
  code: 'open-port',
  severity: 'caution',
  title: 'Open port',
  description: 'A port with no line and no plug: fluid will leak out or dirt will get in.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const entry of ctx.ports.values()) {
      if (ctx.lineByPort.has(entry.key) || entry.port.plugPartId) continue;
      flags.push({
        code: 'open-port',
        severity: 'caution',
        message: `Port ${entry.port.label || entry.port.id} on ${entry.unit.label || entry.unit.id} has no line and no plug.`,
        target: portTarget(entry.unit.id, entry.port.id),
        fix: 'Draw a line to this port or pick a plug for it.',
      });
    }
    return flags;
  },
};
