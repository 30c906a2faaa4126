import { formatInches } from '../units/length-format.js';
import type { Flag } from './flag.js';
import { endName, lineTarget, partName, type Rule } from './rule.js';

export const incompleteLineRule: Rule = {
  code: 'incomplete-line',
  severity: 'blocker',
  title: 'Line not complete',
  description:
    'Every line needs a hose and a hose end at each end, with only adapters, bulkheads and seals between the port and the hose end; and the end stacks must leave some hose to cut.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const problems: string[] = [];
      if (line.hoseStatus === 'none') problems.push('no hose is picked');
      if (line.hoseStatus === 'not-a-hose') problems.push(`${line.line.hosePartId} is not a hose`);
      for (const end of ['from', 'to'] as const) {
        const stack = line.stacks[end];
        if (!stack.hoseEnd && stack.missingIds.length === 0) problems.push(`${endName(line, end)} has no hose end last`);
        for (const item of stack.misplaced) problems.push(`${partName(item.part!)} cannot sit in the end stack at ${endName(line, end)}`);
      }
      const exact = line.report.exactCutIn;
      if (exact !== null && exact <= 0) {
        problems.push(`the end stacks are longer than the line (cut length ${formatInches(exact)} in)`);
      }
      if (problems.length === 0) continue;
      flags.push({
        code: 'incomplete-line',
        severity: 'blocker',
        message: `Line incomplete: ${problems.join('; ')}.`,
        target: lineTarget(line.line.id),
        fix: 'Pick the hose and a hose end for each end; check the scale or measured length.',
      });
    }
    return flags;
  },
};
