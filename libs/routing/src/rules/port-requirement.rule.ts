import { meetsRequirement, type PortRequirement } from '@linesmith/catalog';
import type { Flag, FlagTarget } from './flag.js';
import { endName, jointTarget, partName, type Rule } from './rule.js';

const flagFor = (where: string, requirement: PortRequirement & { reason: string }, inPort: string, target: FlagTarget): Flag => ({
  code: 'port-requirement',
  severity: 'blocker',
  message: `The port at ${where} needs a ${requirement.feature} fitting (${requirement.reason}); it has ${inPort}.`,
  target,
  fix: `Put a ${requirement.feature} fitting in this port first.`,
});

export const portRequirementRule: Rule = {
  code: 'port-requirement',
  severity: 'blocker',
  title: 'Port needs a particular fitting',
  description:
    'Some ports need one specific fitting, for example a transmission return port that also feeds the gear train’s lubrication needs the long-nose fitting: a short one starves it. The part screwed into the port (seals aside) must have the feature the port asks for, and a plug in such a port does not.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      for (const end of ['from', 'to'] as const) {
        const requirement = line[end]?.port.requirement;
        if (!requirement) continue;
        // An O-ring or washer listed first sits on the part; the part in the port is the first non-seal.
        const first = line.stacks[end].items.find((i) => i.part?.kind !== 'seal');
        if (first && !first.part) continue; // an unknown part is flagged by missing-part
        if (first?.part && meetsRequirement(first.part, requirement)) continue;
        const inPort = first?.part ? partName(first.part) : 'nothing';
        flags.push(flagFor(endName(line, end), requirement, inPort, jointTarget(line.line.id, end, first?.index ?? 0)));
      }
    }
    for (const entry of ctx.ports.values()) {
      const { requirement, plugPartId } = entry.port;
      if (!requirement || !plugPartId || ctx.lineByPort.has(entry.key)) continue;
      const plug = ctx.parts.get(plugPartId);
      if (!plug || meetsRequirement(plug, requirement)) continue; // an unknown plug is flagged by open-port and missing-part
      const where = `${entry.unit.label || entry.unit.id} ${entry.port.label || entry.port.id}`;
      flags.push(flagFor(where, requirement, `the plug ${partName(plug)}`, { kind: 'joint', id: `${entry.key}:plug`, unitId: entry.unit.id }));
    }
    return flags;
  },
};
