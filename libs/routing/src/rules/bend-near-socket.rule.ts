import { hoseFit } from '../lines/hose-fit.js';
import { formatInches } from '../units/length-format.js';
import { rigidWords } from './bend-radius.rule.js';
import { isBelow } from './compare.js';
import type { Flag } from './flag.js';
import { endName, type Rule } from './rule.js';

export const bendNearSocketRule: Rule = {
  code: 'bend-near-socket',
  severity: 'caution',
  title: 'Bend too close to the socket',
  description:
    'A hose bent right where it leaves the hose end’s socket kinks and pulls out of the socket over time. Common practice leaves a straight stretch of hose past the socket before a bend starts — by default 2 hose outside diameters (the shop’s rule).',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      if (!line.centreline || !line.hose) continue;
      const fit = hoseFit(line, ctx.rules);
      for (const end of [fit.from, fit.to]) {
        const start = end.firstBendStartIn;
        if (start === null || end.firstBendCorner === null || end.straightIn <= 0) continue;
        // Inside the rigid length is bend-radius's blocker; this is the straight stretch past it.
        if (isBelow(start, end.rigidIn) || !isBelow(start, end.rigidIn + end.straightIn)) continue;
        flags.push({
          code: 'bend-near-socket',
          severity: 'caution',
          message: `Corner ${end.firstBendCorner + 1} starts bending ${formatInches(start - end.rigidIn)} in past the socket at ${endName(line, end.end)}; the shop asks for ${formatInches(end.straightIn)} in of straight hose there (${ctx.rules.straightAfterSocketOd} × the ${formatInches(line.hose.attributes.odIn)} in OD) after ${formatInches(end.rigidIn)} in of rigid fitting (${rigidWords(end)}).`,
          target: { kind: 'line', id: line.line.id, lineId: line.line.id, end: end.end, index: end.firstBendCorner },
          fix: `Move the corner so the bend starts at least ${formatInches(end.rigidIn + end.straightIn)} in from the port, or use an angled hose end.`,
        });
      }
    }
    return flags;
  },
};
