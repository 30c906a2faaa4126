import type { Flag } from './flag.js';
import { lineTarget, partName, type Rule } from './rule.js';

export const ratingTemperatureRule: Rule = {
  code: 'rating-temperature',
  severity: 'blocker',
  title: 'Rated below the circuit temperature',
  description: 'A hose or fire sleeve rated below the circuit’s highest fluid temperature ages, hardens and fails early.',
  check(ctx) {
    const flags: Flag[] = [];
    const need = ctx.doc.circuit.maxTempF;
    for (const line of ctx.lines) {
      const hose = line.hose;
      if (hose && hose.attributes.maxTempF < need) {
        flags.push({
          code: 'rating-temperature',
          severity: 'blocker',
          message: `${partName(hose)} is rated to ${hose.attributes.maxTempF} °F; the circuit reaches ${need} °F.`,
          target: lineTarget(line.line.id),
          fix: 'Choose a hose rated at or above the circuit temperature.',
        });
      }
      for (const sleeve of line.line.sleeves) {
        const part = sleeve.partId ? ctx.parts.get(sleeve.partId) : undefined;
        if (part?.kind !== 'sleeve' || part.attributes.maxTempF >= need) continue;
        flags.push({
          code: 'rating-temperature',
          severity: 'blocker',
          message: `Sleeve ${sleeve.id} (${partName(part)}) is rated to ${part.attributes.maxTempF} °F; the circuit reaches ${need} °F.`,
          target: lineTarget(line.line.id),
          fix: 'Choose a sleeve rated at or above the circuit temperature.',
        });
      }
    }
    return flags;
  },
};
