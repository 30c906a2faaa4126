import { meetsRequirement } from '@linesmith/catalog';
import type { Flag } from './flag.js';
import { endName, jointTarget, partName, type Rule } from './rule.js';

export const portRequirementRule: Rule = {
  code: 'port-requirement',
  severity: 'blocker',
  title: 'Port needs a particular fitting',
  description:
    'Some ports need one specific fitting, for example a transmission return port that also feeds the gear train’s lubrication needs the long-nose fitting: a short one starves it. The part screwed into the port must have the feature the port asks for.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      for (const end of ['from', 'to'] as const) {
        const requirement = line[end]?.port.requirement;
        if (!requirement) continue;
        const first = line.stacks[end].items[0];
        if (first && !first.part) continue; // an unknown part is flagged by missing-part
        if (first?.part && meetsRequirement(first.part, requirement)) continue;
        const inPort = first?.part ? partName(first.part) : 'nothing';
        flags.push({
          code: 'port-requirement',
          severity: 'blocker',
          message: `The port at ${endName(line, end)} needs a ${requirement.feature} fitting (${requirement.reason}); it has ${inPort}.`,
          target: jointTarget(line.line.id, end, 0),
          fix: `Put a ${requirement.feature} fitting in this port first.`,
        });
      }
    }
    return flags;
  },
};
