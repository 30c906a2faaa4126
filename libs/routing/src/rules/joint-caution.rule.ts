import type { Flag } from './flag.js';
import { endName, jointTarget, partName, type Rule } from './rule.js';

/**
 * Joints that join but need care: NPTF against NPT (the dry seal is not assured), a BSP taper
 * male in a parallel female (ISO 7-1 R into Rp), an NPSM swivel on a pipe-thread male (only with
 * the 30° seat). The catalogue's mate() words each caution.
 */
export const jointCautionRule: Rule = {
  code: 'joint-caution',
  severity: 'caution',
  title: 'Joint that needs care',
  description:
    'Two ends that do join but only with care: a dryseal NPTF thread against an NPT one (use a sealant, the dry seal is not assured), a BSP taper male in a BSP parallel female (allowed by ISO 7-1, sealed on the thread), or an NPSM swivel on a pipe-thread male (seals only on a 30° seat). A reviewer acknowledges each one.',
  check(ctx) {
    const flags: Flag[] = [];
    const fix = 'Use an adapter with matching ends on both sides, or follow the caution and leak-test the joint before the line is used.';
    for (const line of ctx.lines) {
      for (const end of ['from', 'to'] as const) {
        for (const joint of line.stacks[end].joints) {
          if (!joint.result.ok || !joint.result.caution) continue;
          const part = ctx.parts.get(joint.partId);
          const name = part ? partName(part) : joint.partId;
          const where = joint.index === 0 ? `At ${endName(line, end)}, port to ${name}` : `At ${endName(line, end)}, joint ${joint.index} (${name})`;
          flags.push({ code: 'joint-caution', severity: 'caution', message: `${where}: ${joint.result.message} ${joint.result.caution}`, target: jointTarget(line.line.id, end, joint.index), fix });
        }
      }
    }
    for (const entry of ctx.ports.values()) {
      const plugId = entry.port.plugPartId;
      const plug = plugId ? ctx.parts.get(plugId) : undefined;
      if (plug?.kind !== 'plug' || ctx.lineByPort.has(entry.key)) continue;
      const result = ctx.mate(entry.port.connection, plug.attributes.connection);
      if (!result.ok || !result.caution) continue;
      flags.push({
        code: 'joint-caution',
        severity: 'caution',
        message: `${partName(plug)} in port ${entry.key}: ${result.message} ${result.caution}`,
        target: { kind: 'joint', id: `${entry.key}:plug`, unitId: entry.unit.id },
        fix,
      });
    }
    return flags;
  },
};
