import type { MateResult } from '../lines/end-stack.js';
import type { Flag } from './flag.js';
import { endName, jointTarget, type RuleContext } from './rule.js';

type JointCode = Exclude<MateResult['code'], 'ok'>;

/** Every threaded joint of the circuit (end stacks and plugs) whose mate() answer is `code`. */
export function jointFlags(ctx: RuleContext, code: JointCode, fix: string): Flag[] {
  const flags: Flag[] = [];
  const say = (r: MateResult, where: string) => `${where}: ${r.message}${r.hint ? ` ${r.hint}` : ''}`;
  for (const line of ctx.lines) {
    for (const end of ['from', 'to'] as const) {
      for (const joint of line.stacks[end].joints) {
        if (joint.result.ok || joint.result.code !== code) continue;
        const where = joint.index === 0 ? `At ${endName(line, end)}, port to ${joint.partId}` : `At ${endName(line, end)}, joint ${joint.index} (${joint.partId})`;
        flags.push({ code, severity: 'blocker', message: say(joint.result, where), target: jointTarget(line.line.id, end, joint.index), fix });
      }
    }
  }
  for (const entry of ctx.ports.values()) {
    const plugId = entry.port.plugPartId;
    const plug = plugId ? ctx.parts.get(plugId) : undefined;
    if (plug?.kind !== 'plug' || ctx.lineByPort.has(entry.key)) continue;
    const result = ctx.mate(entry.port.connection, plug.attributes.connection);
    if (result.ok || result.code !== code) continue;
    flags.push({
      code,
      severity: 'blocker',
      message: say(result, `Plug ${plug.id} in port ${entry.key}`),
      target: { kind: 'joint', id: `${entry.key}:plug`, unitId: entry.unit.id },
      fix,
    });
  }
  return flags;
}
