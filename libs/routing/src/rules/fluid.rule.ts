import type { Flag } from './flag.js';
import { lineTarget, partName, type Rule } from './rule.js';

export const fluidRule: Rule = {
  code: 'fluid',
  severity: 'blocker',
  title: 'Hose not rated for the fluid',
  description:
    'The hose liner must be rated for the fluid it carries: ethanol blends such as E85 need a PTFE-lined hose, and fuel must never run in a hose rated only for oil or coolant.',
  check(ctx) {
    const flags: Flag[] = [];
    const fluid = ctx.doc.circuit.fluid;
    for (const line of ctx.lines) {
      const hose = line.hose;
      if (!hose || hose.attributes.fluids.includes(fluid)) continue;
      flags.push({
        code: 'fluid',
        severity: 'blocker',
        message: `${partName(hose)} (${hose.attributes.liner} liner) is rated for ${hose.attributes.fluids.join(', ')}, not ${fluid}.`,
        target: lineTarget(line.line.id),
        fix: `Choose a hose rated for ${fluid}${fluid === 'e85' ? ' (PTFE liner)' : ''}.`,
      });
    }
    return flags;
  },
};
