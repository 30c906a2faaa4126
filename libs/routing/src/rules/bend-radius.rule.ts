import { bendRadiusCheck, hoseFit, STRAIGHT_RAD, type RigidEnd } from '../lines/hose-fit.js';
import { formatInches } from '../units/length-format.js';
import { isBelow } from './compare.js';
import type { Flag } from './flag.js';
import { endName, partName, type Rule } from './rule.js';

/** A radius as a maker's table gives it: decimals to the thousandth (2.155), not a tape fraction that could hide the shortfall. */
const radiusText = (valueIn: number): string => String(Number(valueIn.toFixed(3)));

/** "adapters 1/2 in + hose end 1-1/4 in" — what the rigid length at one end is made of. */
export function rigidWords(end: RigidEnd): string {
  const parts: string[] = [];
  if (end.adaptersIn > 0) parts.push(`adapters ${formatInches(end.adaptersIn)} in`);
  if (end.hoseEndIn > 0) parts.push(`hose end ${formatInches(end.hoseEndIn)} in${end.hoseEndEstimated ? ' (its cut-off allowance; the part gives no rigid length)' : ''}`);
  return parts.join(' + ') || 'no fittings';
}

export const bendRadiusRule: Rule = {
  code: 'bend-radius',
  severity: 'blocker',
  title: 'Bend too tight',
  description:
    'Hose makers quote the minimum bend radius to the inside of the bend (SAE J517 and makers’ data), so the inside radius — the drawn centreline radius less half the hose’s outside diameter — must be no smaller than the hose’s minimum (the catalogue can mark a hose whose maker quotes the centreline). No bend may start inside the rigid length of an end (adapters plus the hose end up to where the hose leaves the socket), and two bends need room between them: when their curves overlap the route cannot be built as drawn.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const detail = line.centreline;
      if (!detail) continue;
      const lineId = line.line.id;
      const hose = line.hose;
      if (hose) {
        for (const bend of detail.bends) {
          if (bend.deflectionRad < STRAIGHT_RAD) continue;
          const check = bendRadiusCheck(bend.radiusIn, hose);
          if (!isBelow(check.comparedIn, check.minIn)) continue;
          const corner = bend.pointIndex - 1; // route point 0 is the from port
          const radii =
            check.basis === 'inside'
              ? `its inside radius is ${radiusText(check.insideIn)} in (centreline ${radiusText(check.centrelineIn)} in less half the ${radiusText(hose.attributes.odIn)} in hose OD)`
              : `its centreline radius is ${radiusText(check.centrelineIn)} in (inside ${radiusText(check.insideIn)} in)`;
          flags.push({
            code: 'bend-radius',
            severity: 'blocker',
            message: `Corner ${corner + 1}: ${radii}; ${partName(hose)} needs at least ${radiusText(check.minIn)} in, quoted to the ${check.basis === 'inside' ? 'inside of the bend' : 'centreline'}.`,
            target: { kind: 'line', id: lineId, lineId, index: corner },
            fix: `Open the bend up to at least ${radiusText(check.minIn + (check.basis === 'inside' ? hose.attributes.odIn / 2 : 0))} in centreline radius, add a 45° or 90° hose end, or reroute.`,
          });
        }
        const fit = hoseFit(line, ctx.rules);
        for (const end of [fit.from, fit.to]) {
          if (end.firstBendStartIn === null || end.firstBendCorner === null || !isBelow(end.firstBendStartIn, end.rigidIn)) continue;
          flags.push({
            code: 'bend-radius',
            severity: 'blocker',
            message: `Corner ${end.firstBendCorner + 1} starts bending ${formatInches(Math.max(0, end.firstBendStartIn))} in from the port face at ${endName(line, end.end)}, inside the ${formatInches(end.rigidIn)} in of rigid fitting there (${rigidWords(end)}).`,
            target: { kind: 'line', id: lineId, lineId, end: end.end, index: end.firstBendCorner },
            fix: `Move the corner so the bend starts at least ${formatInches(end.rigidIn + end.straightIn)} in from the port (rigid length plus the shop’s straight stretch), or use an angled hose end or adapter.`,
          });
        }
      }
      if (!detail.fits) {
        flags.push({
          code: 'bend-radius',
          severity: 'blocker',
          message: 'Two bends overlap (or a bend turns back on itself): the route cannot be bent as drawn.',
          target: { kind: 'line', id: lineId, lineId },
          fix: 'Lengthen the straight between the bends or use smaller radii that the hose allows.',
        });
      }
    }
    return flags;
  },
};
