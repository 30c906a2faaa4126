import type { Flag } from './flag.js';
import { lineTarget, portTarget, type Rule } from './rule.js';

export const missingPartRule: Rule = {
  code: 'missing-part',
  severity: 'blocker',
  title: 'Part not in the catalogue',
  description:
    'The circuit names a part the shop’s catalogue no longer has (deleted, or never imported). Nothing about that part can be checked or ordered.',
  check(ctx) {
    const flags: Flag[] = [];
    const flag = (id: string, where: string, target: Flag['target']) =>
      flags.push({
        code: 'missing-part',
        severity: 'blocker',
        message: `Part ${id} (${where}) is not in the catalogue.`,
        target,
        fix: 'Pick the part again from the catalogue.',
      });
    for (const line of ctx.lines) {
      const target = lineTarget(line.line.id);
      if (line.hoseStatus === 'missing') flag(line.line.hosePartId!, 'hose', target);
      for (const end of ['from', 'to'] as const) {
        for (const id of line.stacks[end].missingIds) flag(id, `${end} end stack`, target);
      }
      for (const sleeve of line.line.sleeves) {
        if (sleeve.partId && !ctx.parts.has(sleeve.partId)) flag(sleeve.partId, `sleeve ${sleeve.id}`, target);
      }
    }
    for (const entry of ctx.ports.values()) {
      const plugId = entry.port.plugPartId;
      if (plugId && !ctx.parts.has(plugId)) flag(plugId, `plug in ${entry.key}`, portTarget(entry.unit.id, entry.port.id));
    }
    return flags;
  },
};
